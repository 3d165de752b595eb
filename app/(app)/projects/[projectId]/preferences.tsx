"use client";
import { useState } from "react";
import { errorText } from "@/components/spec/api";
import { formatDateTime } from "@/components/spec/format";
import { useClearPreference, useOwnPreference, usePreferenceSummary, useRecordPreference } from "@/lib/query/hooks";
import type { SchemeSummary } from "@/lib/spec/projects";

/** For the firm: where the committee leans. */
export function PreferenceSummaryPanel({ projectId }: { projectId: string }) {
  const { data } = usePreferenceSummary(projectId);
  if (!data) return null;
  const recorded = data.members.filter((m) => m.preference).length;
  return (
    <section className="panel" aria-labelledby="prefs-heading" data-testid="preference-summary">
      <h2 id="prefs-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">The committee&apos;s preferences</h2>
      {data.members.length === 0 ? (
        <p className="px-4 py-3 text-sm text-tin">No committee members yet.</p>
      ) : (
        <div className="space-y-3 px-4 py-3 text-sm">
          <p className="text-ink-soft">{recorded} of {data.members.length} members have said which scheme they prefer.</p>
          <ul className="space-y-1" aria-label="Preferences by scheme">
            {data.schemes.map((s) => (
              <li key={s.schemeId} className="flex items-center gap-2" data-testid={`preference-count-${s.schemeName}`}>
                <span className="flex-1">{s.schemeName}</span>
                <span className="num font-semibold">{s.count}</span>
                {s.count > 0 && <span aria-hidden="true" className="inline-block h-2 rounded bg-brass" style={{ width: `${s.count * 24}px` }} />}
              </li>
            ))}
          </ul>
          <table className="w-full text-left text-sm">
            <thead className="text-xs uppercase tracking-wide text-tin"><tr><th className="py-1">Member</th><th className="py-1">Prefers</th><th className="py-1">Since</th></tr></thead>
            <tbody>
              {data.members.map((m) => (
                <tr key={m.userId} className="border-t border-tin-rule align-top" data-testid={`preference-of-${m.name}`}>
                  <td className="py-1 pr-2 font-medium">{m.name}</td>
                  <td className="py-1 pr-2">{m.preference ? <>{m.preference.schemeName}{m.preference.note && <span className="block text-xs italic text-ink-soft">“{m.preference.note}”</span>}</> : <span className="text-tin">not yet</span>}</td>
                  <td className="py-1 num text-xs">{m.preference ? formatDateTime(m.preference.updatedAt) : "–"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}

/** For a committee member: their one preferred scheme, which they can change. */
export function MyPreference({ projectId, schemes }: { projectId: string; schemes: SchemeSummary[] }) {
  const own = useOwnPreference(projectId);
  const record = useRecordPreference(projectId);
  const clear = useClearPreference(projectId);
  const [choice, setChoice] = useState<string | null>(null);
  const [note, setNote] = useState<string | null>(null);
  const current = own.data ?? null;
  const selected = choice ?? current?.schemeId ?? "";
  const error = record.error ?? clear.error;
  return (
    <section className="panel" aria-labelledby="my-pref-heading" data-testid="my-preference">
      <h2 id="my-pref-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Your preference</h2>
      <form
        className="space-y-3 px-4 py-3 text-sm"
        onSubmit={(e) => {
          e.preventDefault();
          if (selected) record.mutate({ schemeId: selected, note: note ?? current?.note ?? "" }, { onSuccess: () => { setChoice(null); setNote(null); } });
        }}
      >
        <p className="text-ink-soft">
          {current ? <>You prefer <strong data-testid="my-preference-name">{current.schemeName}</strong> (since {formatDateTime(current.updatedAt)}). You can change it at any time.</> : "Which scheme would you choose? The organ builder sees each member's preference."}
        </p>
        <fieldset className="space-y-1">
          <legend className="label">Preferred scheme</legend>
          {schemes.map((s) => (
            <label key={s.id} className="flex items-center gap-2">
              <input type="radio" name="preferred" className="accent-brass" value={s.id} checked={selected === s.id} onChange={() => setChoice(s.id)} />
              {s.name}
            </label>
          ))}
        </fieldset>
        <div>
          <label className="label" htmlFor="pref-note">Why (optional)</label>
          <textarea id="pref-note" rows={2} className="field" maxLength={1000} value={note ?? current?.note ?? ""} onChange={(e) => setNote(e.target.value)} />
        </div>
        <div className="flex flex-wrap gap-2">
          <button type="submit" className="btn-primary" disabled={!selected || record.isPending}>{current ? "Change my preference" : "Record my preference"}</button>
          {current && <button type="button" className="btn" disabled={clear.isPending} onClick={() => clear.mutate(undefined)}>I have no preference</button>}
        </div>
        {error && <p role="alert" className="field-error">✕ {errorText(error)}</p>}
      </form>
    </section>
  );
}
