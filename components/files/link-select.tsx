"use client";
import { pitchText } from "@/components/spec/format";
import type { FileLink } from "@/lib/files/kinds";

export type LinkTarget = {
  schemeId: string;
  schemeName: string;
  divisions: { id: string; name: string; stops: { id: string; name: string; footage: string | number; ranks: number; family: string }[] }[];
};

/** One select for "what does this file show": nothing, a division, or a stop, of one of the project's schemes. */
export function encodeLink(link: FileLink | null | undefined): string {
  if (!link) return "";
  return link.stopId ? `${link.schemeId}|s|${link.stopId}` : link.divisionId ? `${link.schemeId}|d|${link.divisionId}` : "";
}

export function decodeLink(value: string): FileLink | null {
  const [schemeId, kind, id] = value.split("|");
  if (!schemeId || !id) return null;
  return kind === "s" ? { schemeId, stopId: id } : { schemeId, divisionId: id };
}

export function LinkSelect({ id, targets, value, onChange, disabled }: { id: string; targets: LinkTarget[]; value: string; onChange: (v: string) => void; disabled?: boolean }) {
  return (
    <select id={id} className="field" value={value} onChange={(e) => onChange(e.target.value)} disabled={disabled}>
      <option value="">— not linked —</option>
      {targets.map((t) => (
        <optgroup key={t.schemeId} label={t.schemeName}>
          {t.divisions.map((d) => [
            <option key={`d-${d.id}`} value={`${t.schemeId}|d|${d.id}`}>{d.name} (the division)</option>,
            ...d.stops.map((s) => (
              <option key={`s-${s.id}`} value={`${t.schemeId}|s|${s.id}`}>
                {"\u2003"}{d.name}: {s.name} {pitchText(s)}
              </option>
            )),
          ])}
        </optgroup>
      ))}
    </select>
  );
}

/** "Scheme A · Great: Trumpet" as a file's link reads in lists. */
export function linkWords(link: { schemeName: string; divisionName: string | null; stopName: string | null; missing: boolean; stopId?: string; divisionId?: string }): string {
  if (link.missing) return `${link.schemeName} · a ${link.stopId ? "stop" : "division"} no longer in the scheme`;
  if (link.stopName) return `${link.schemeName} · ${link.stopName}`;
  if (link.divisionName) return `${link.schemeName} · ${link.divisionName}`;
  return link.schemeName;
}
