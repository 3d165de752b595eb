"use client";
/**
 * The editor's Scales tab: a division's scaling chart with a rank's scale beside it, and a scale
 * fitted from survey measurements. Every change is an ordinary edit of the document (`onChange`),
 * so it saves, undoes, keeps revisions and meets conflicts like any other; the chart follows the
 * document in the same render, the figures when the estimate worker answers.
 */
import Link from "next/link";
import { useMemo, useState } from "react";
import { parseCompass } from "@/lib/estimate/notes";
import { parseFootage, semitonesAbove8ft } from "@/lib/estimate/pitch";
import { deviationHt, fitScale, RANK_C_MIDI, type FitResult } from "@/lib/drawing/scale-fit";
import { SQUARE_SIDE_PER_DIAMETER } from "@/lib/estimate/scale";
import { midiToNote, noteToMidi } from "@/lib/estimate/notes";
import { scalingChart } from "@/lib/drawing/scaling-chart";
import { lengthIn, lengthToMm, lengthUnitLabel, type DrawingUnits } from "@/lib/drawing/units";
import type { DrawingRules } from "@/lib/spec/estimate";
import type { DocStop, SchemeDocument, Tuning } from "@/lib/spec/document";
import { findStop, updateStop } from "@/components/spec/doc-ops";
import { footageText, noteText } from "@/components/spec/format";
import { useDrawingScheme } from "@/components/spec/drawing-scheme";
import { chestWords, fitState } from "@/components/spec/chest-words";
import { StateMark } from "@/components/ui/state-mark";
import type { Figures } from "@/components/spec/use-figures";
import { ScalingChartSvg, signedHt, type Overlay } from "./scaling-chart-svg";

const WOODS = ["pine", "oak", "mahogany"];
const DEFAULT_NOTES = ["C", "c", "c'", "c''", "c'''"];

type ScaleDraft = { deviationHt: string; halvingOn: string; mouthWidth: string; cutUp: string };
type ScaleErrors = Partial<Record<keyof ScaleDraft, string>>;
type Row = { note: string; size: string };

const draftOf = (s: DocStop["scale"]): ScaleDraft => ({
  deviationHt: String(s.deviationHt),
  halvingOn: String(s.halvingOn),
  mouthWidth: String(s.mouthWidth),
  cutUp: s.cutUp === undefined ? "" : String(s.cutUp),
});

/** A number as people type it: "−1.5" with a true minus, "1/4" as a fraction, a decimal comma. */
export function readNumber(text: string): number | null {
  const t = text.trim().replace(/[−–]/g, "-").replace(",", ".");
  if (t === "") return null;
  const frac = /^(-?\d+(?:\.\d+)?)\s*\/\s*(\d+(?:\.\d+)?)$/.exec(t);
  if (frac) return Number(frac[2]) === 0 ? Number.NaN : Number(frac[1]) / Number(frac[2]);
  return /^[-+]?\d+(?:\.\d+)?$/.test(t) ? Number(t) : Number.NaN;
}

/** The scale a draft describes, or every field's problem in the product's words. */
export function readScale(d: ScaleDraft): { ok: true; scale: DocStop["scale"] } | { ok: false; errors: ScaleErrors } {
  const errors: ScaleErrors = {};
  const dev = readNumber(d.deviationHt);
  const halving = readNumber(d.halvingOn);
  const mouth = readNumber(d.mouthWidth);
  const cut = readNumber(d.cutUp);
  if (dev === null || Number.isNaN(dev) || dev < -48 || dev > 48) errors.deviationHt = "Enter the deviation in semitones from the normal scale, from −48 to +48 (e.g. −2 or 1.5).";
  if (halving === null || !Number.isInteger(halving) || halving < 8 || halving > 32) errors.halvingOn = "The halving note is a whole note from 8 to 32 (the normal scale halves on the 17th).";
  if (mouth === null || Number.isNaN(mouth) || mouth <= 0 || mouth >= 1) errors.mouthWidth = "The mouth width is a fraction of the circumference, e.g. 1/4 (normal) or 2/9.";
  if (cut !== null && (Number.isNaN(cut) || cut < 0.1 || cut > 0.8)) errors.cutUp = "The cut-up is a fraction of the mouth width from 0.1 to 0.8 (e.g. 1/4), or blank for the firm's norm.";
  if (Object.keys(errors).length) return { ok: false, errors };
  return { ok: true, scale: { deviationHt: dev!, halvingOn: halving!, mouthWidth: mouth!, ...(cut === null ? {} : { cutUp: cut }) } };
}

export function ScalesView({
  doc, tuning, figures, rules, units, editable, projectId, schemeId, onChange,
}: {
  doc: SchemeDocument;
  tuning: Tuning;
  /** Null until the estimate worker first answers. */
  figures: Figures | null;
  rules: DrawingRules;
  units: DrawingUnits;
  editable: boolean;
  projectId: string;
  schemeId: string;
  onChange: (next: SchemeDocument, label: string) => void;
}) {
  const [divisionId, setDivisionId] = useState<string>(doc.divisions[0]?.id ?? "");
  const division = doc.divisions.find((d) => d.id === divisionId) ?? doc.divisions[0];
  const scalable = (division?.stops ?? []).filter((s) => s.origin !== "extension" && s.origin !== "borrowed" && s.origin !== "removed");
  const [stopId, setStopId] = useState<string>(scalable[0]?.id ?? "");
  const stop = scalable.find((s) => s.id === stopId) ?? scalable[0];

  const parsed = useDrawingScheme(doc, tuning, figures);
  const chestFigures = figures?.ok ? figures.estimate.divisions.find((d) => d.id === division?.id) : undefined;
  const chest = chestFigures && chestFigures.chest.main.rows > 0
    ? { words: chestWords(chestFigures.chest.main, chestFigures.chest.space, chestFigures.chest.fit, units), state: fitState(chestFigures.chest.fit, true) }
    : null;
  const chart = useMemo(() => {
    if (!parsed || !division) return null;
    if (!parsed.scheme.divisions.some((d) => d.id === division.id)) return null;
    return scalingChart(parsed.scheme, division.id, rules, parsed.plan);
  }, [parsed, division, rules]);

  if (!division) return <div className="panel p-4 text-sm">Add a division to see its scales.</div>;
  return (
    <div className="space-y-3" data-testid="scales">
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label className="label" htmlFor="scales-division">Division</label>
          <select id="scales-division" className="field" value={division.id} onChange={(e) => { setDivisionId(e.target.value); setStopId(""); }}>
            {doc.divisions.map((d) => <option key={d.id} value={d.id}>{d.name}</option>)}
          </select>
        </div>
        <Link className="btn" href={`/projects/${projectId}/schemes/${schemeId}/pipes${stop ? `?stop=${encodeURIComponent(stop.id)}` : ""}`}>Pipe tables</Link>
      </div>
      <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="panel min-w-0 p-3">
          <h3 className="mb-1 text-base font-semibold">Scales of the {division.name}</h3>
          {chest && (
            // The chest the scales make: a wider scale is a longer and deeper chest (the Chests tab draws it).
            <p className={`mb-1 flex items-start gap-1.5 text-sm ${chest.state === "clash" ? "font-semibold text-clash" : chest.state === "fit" ? "text-fit" : "text-ink-soft"}`} data-testid="scales-chest-words" data-fits={chest.state}>
              <StateMark kind={chest.state} className="mt-0.5 h-4 w-4" />
              <span>{division.name} chest: {chest.words}</span>
            </p>
          )}
          <p className="mb-2 text-xs text-tin">
            Each rank&apos;s pipes as semitones wider (+) or narrower (−) than the normal scale (8′ C 155.5 mm, halving on the 17th note). A level line keeps the normal halving; a rising line widens towards the treble (a later halving), a falling one narrows.
          </p>
          {chart ? (
            <ScalingChartSvg chart={chart} selected={stop?.id} overlay={stop ? surveyOverlay(stop) : null} pipeTableHref={(id) => `/projects/${projectId}/schemes/${schemeId}/pipes?stop=${encodeURIComponent(id)}`} />
          ) : (
            figures ? (
              <p className="text-sm text-caution" role="status">The chart waits for the scheme to be complete: {figures.ok ? "" : figures.messages[0]}</p>
            ) : (
              <p className="text-sm text-tin" role="status" aria-busy="true">Working out the scales…</p>
            )
          )}
        </div>
        {stop && (
          <div className="space-y-3">
            <div>
              <label className="label" htmlFor="scales-stop">Rank</label>
              <select id="scales-stop" className="field" value={stop.id} onChange={(e) => setStopId(e.target.value)}>
                {scalable.map((s) => <option key={s.id} value={s.id}>{s.name} {footageText(s.footage)}</option>)}
              </select>
            </div>
            <ScaleForm key={`${stop.id}:${JSON.stringify(stop.scale)}`} stop={stop} editable={editable} onApply={(scale) => onChange(updateStop(doc, { ...stop, scale }), `Changed the scale of ${division.name} ${stop.name}`)} />
            {editable && (
              <SurveyFit
                key={stop.id}
                stop={stop}
                compass={stop.compass ?? division.compass}
                units={units}
                chart={chart}
                onAccept={(scale, survey) => {
                  const found = findStop(doc, stop.id);
                  if (!found) return;
                  onChange(updateStop(doc, { ...found.stop, scale: { ...found.stop.scale, ...scale }, survey }), `Fitted the scale of ${division.name} ${stop.name} to the survey`);
                }}
              />
            )}
          </div>
        )}
      </div>
    </div>
  );
}

/** A stop's kept survey as points on the chart: each measured pipe's own deviation from the normal scale. */
function surveyOverlay(stop: DocStop): Overlay | null {
  if (!stop.survey?.length) return null;
  const ref = semitonesAbove8ft(parseFootage(stop.footage) ?? { num: 8, den: 1 });
  const wooden = WOODS.includes(stop.material);
  const measured = stop.survey.flatMap((m) => {
    const key = noteToMidi(m.note);
    if (key === null) return [];
    const d = wooden ? m.sizeMm / SQUARE_SIDE_PER_DIAMETER : m.sizeMm;
    return [{ keyMidi: key, note: midiToNote(key), deviationHt: deviationHt(ref + key - RANK_C_MIDI, d) }];
  });
  return { stopId: stop.id, measured, fitted: null };
}

function ScaleForm({ stop, editable, onApply }: { stop: DocStop; editable: boolean; onApply: (scale: DocStop["scale"]) => void }) {
  const [draft, setDraft] = useState<ScaleDraft>(() => draftOf(stop.scale));
  const [errors, setErrors] = useState<ScaleErrors>({});
  const wooden = WOODS.includes(stop.material);
  const field = (key: keyof ScaleDraft, label: string, hint: string) => (
    <div>
      <label className="label" htmlFor={`scale-${key}`}>{label}</label>
      <input id={`scale-${key}`} className="field" inputMode="decimal" value={draft[key]} disabled={!editable} aria-invalid={!!errors[key]} aria-describedby={`scale-${key}-hint`}
        onChange={(e) => setDraft({ ...draft, [key]: e.target.value })} />
      {errors[key] ? <p className="field-error" id={`scale-${key}-hint`}>✕ {errors[key]}</p> : <p className="mt-0.5 text-[11px] text-tin" id={`scale-${key}-hint`}>{hint}</p>}
    </div>
  );
  return (
    <form
      className="panel space-y-2 p-3"
      aria-label={`Scale of ${stop.name}`}
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        const r = readScale(draft);
        if (!r.ok) return setErrors(r.errors);
        setErrors({});
        onApply(r.scale);
      }}
    >
      <h3 className="text-sm font-semibold">Scale of {stop.name} {footageText(stop.footage)}</h3>
      <div className="grid grid-cols-2 gap-2">
        {field("deviationHt", "Deviation (semitones)", "at the rank's C; + wider")}
        {field("halvingOn", "Halving on note", "normal 17")}
        {field("mouthWidth", "Mouth width", wooden ? "wooden mouths span the pipe" : "of the circumference, normal 1/4")}
        {field("cutUp", "Cut-up", "of the mouth width; blank: firm's norm")}
      </div>
      {editable && <button type="submit" className="btn-primary">Apply scale</button>}
    </form>
  );
}

function SurveyFit({
  stop, compass, units, chart, onAccept,
}: {
  stop: DocStop;
  compass: { low: string; high: string };
  units: DrawingUnits;
  chart: ReturnType<typeof scalingChart> | null;
  onAccept: (scale: { deviationHt: number; halvingOn: number }, survey: { note: string; sizeMm: number }[]) => void;
}) {
  const wooden = WOODS.includes(stop.material);
  const keys = parseCompass(stop.compass ?? compass) ?? { lowMidi: 36, highMidi: 96 };
  // The survey kept with the stop, in the firm's units; otherwise the C of each octave to fill in.
  const [rows, setRows] = useState<Row[]>(() =>
    stop.survey?.length
      ? stop.survey.map((m) => ({ note: m.note, size: String(Number(lengthIn(units, m.sizeMm).toFixed(units === "mm" ? 1 : 3))) }))
      : DEFAULT_NOTES.map((note) => ({ note, size: "" })),
  );
  const [result, setResult] = useState<FitResult | null>(null);
  const L = lengthUnitLabel(units);
  const ref = semitonesAbove8ft(parseFootage(stop.footage) ?? { num: 8, den: 1 });
  const what = wooden ? "inside side" : "diameter";

  function fit() {
    const filled = rows.map((r, i) => ({ r, i })).filter(({ r }) => r.note.trim() !== "" || r.size.trim() !== "");
    const measurements = filled.map(({ r }) => {
      const v = readNumber(r.size);
      return { note: r.note, sizeMm: v === null ? Number.NaN : lengthToMm(units, v) };
    });
    const res = fitScale({
      measurements, referenceSemitones: ref, wooden, compass: keys, currentHalvingOn: stop.scale.halvingOn,
      formatLength: (mm) => `${Number(lengthIn(units, mm).toFixed(units === "mm" ? 1 : 2))} ${L}`,
    });
    // Row numbers in the messages count the rows on screen, blank rows included.
    setResult(res.ok ? res : { ok: false, problems: res.problems.map((p) => ({ ...p, row: p.row === null ? null : filled[p.row].i, message: p.row === null ? p.message : p.message.replace(/^Row \d+/, `Row ${filled[p.row].i + 1}`).replace(/row (\d+)/, (_, n) => `row ${filled[Number(n) - 1].i + 1}`) })) });
  }

  const overlay: Overlay | null = result?.ok
    ? {
        stopId: stop.id,
        measured: result.residuals.map((r) => ({ keyMidi: r.keyMidi, note: r.note, deviationHt: r.deviationHt })),
        fitted: { deviationHt: result.deviationHt, halvingOn: result.halvingOn },
      }
    : null;
  const problemsOf = (i: number) => (result && !result.ok ? result.problems.filter((p) => p.row === i) : []);

  return (
    <section className="panel space-y-2 p-3" aria-label={`Fit a scale from survey measurements: ${stop.name}`}>
      <h3 className="text-sm font-semibold">Fit from survey measurements</h3>
      <p className="text-[11px] text-tin">
        Enter the measured {what} of some of the rank&apos;s pipes ({L}): Stopwright finds the deviation and halving that match them best.
      </p>
      <table className="w-full text-sm">
        <thead><tr className="text-left text-[11px] uppercase tracking-wide text-tin"><th className="pb-1 font-semibold">Note</th><th className="pb-1 font-semibold">{wooden ? "Inside side" : "Diameter"} ({L})</th></tr></thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i}>
              <td className="pr-2 align-top">
                <input aria-label={`Note, row ${i + 1}`} className="field" value={r.note} aria-invalid={problemsOf(i).some((p) => p.field === "note")}
                  onChange={(e) => setRows(rows.map((x, j) => (j === i ? { ...x, note: e.target.value } : x)))} />
              </td>
              <td className="align-top">
                <input aria-label={`${wooden ? "Inside side" : "Diameter"}, row ${i + 1}`} className="field" inputMode="decimal" value={r.size} aria-invalid={problemsOf(i).some((p) => p.field === "size")}
                  onChange={(e) => setRows(rows.map((x, j) => (j === i ? { ...x, size: e.target.value } : x)))} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn" onClick={() => setRows([...rows, { note: "", size: "" }])}>+ Row</button>
        <button type="button" className="btn-primary" onClick={fit}>Fit scale</button>
      </div>
      {result && !result.ok && (
        <ul className="space-y-0.5" role="alert" aria-label="Problems with the measurements">
          {result.problems.map((p, i) => <li key={i} className="field-error">✕ {p.message}</li>)}
        </ul>
      )}
      {result?.ok && (
        <div className="space-y-2" data-testid="fit-result">
          <p className="text-sm">
            Best match: <strong>{signedHt(result.deviationHt)} semitones</strong> at C, halving on note <strong>{result.halvingOn}</strong>
            {!result.halvingFitted && " (kept)"} · scatter {result.rmsHt.toFixed(2)} semitones
          </p>
          <table className="w-full text-xs">
            <caption className="sr-only">Residuals of the fit</caption>
            <thead><tr className="text-left text-tin"><th>Note</th><th className="text-right">Measured</th><th className="text-right">Fitted</th><th className="text-right">Off by</th></tr></thead>
            <tbody>
              {result.residuals.map((r) => (
                <tr key={r.keyMidi} className="border-t border-tin-rule/60">
                  <td>{noteText(r.note)}</td>
                  <td className="text-right">{lengthIn(units, r.measuredMm).toFixed(units === "mm" ? 1 : 2)}</td>
                  <td className="text-right">{lengthIn(units, r.fittedMm).toFixed(units === "mm" ? 1 : 2)}</td>
                  <td className="text-right">{r.mm >= 0 ? "+" : "−"}{Math.abs(lengthIn(units, r.mm)).toFixed(units === "mm" ? 1 : 2)} {L} ({r.ht >= 0 ? "+" : "−"}{Math.abs(r.ht).toFixed(2)} ht)</td>
                </tr>
              ))}
            </tbody>
          </table>
          {result.warnings.map((w) => <p key={w} className="text-xs text-caution">⚠ {w}</p>)}
          {chart && chart.lines.some((l) => l.stopId === stop.id) && (
            <ScalingChartSvg chart={{ ...chart, lines: chart.lines.filter((l) => l.stopId === stop.id) }} selected={stop.id} overlay={overlay} testId="fit-chart" />
          )}
          <button type="button" className="btn-primary" onClick={() => onAccept({ deviationHt: result.deviationHt, halvingOn: result.halvingOn }, result.residuals.map((r) => ({ note: r.note, sizeMm: Math.round(r.measuredMm * 100) / 100 })))}>
            Use the fitted scale
          </button>
        </div>
      )}
    </section>
  );
}
