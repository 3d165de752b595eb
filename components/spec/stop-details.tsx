"use client";
import type { DocDivision, DocStop } from "@/lib/spec/document";
import type { Figures } from "./use-figures";
import { compassText, constructionLabels, familyLabels, findingLabels, footageText, formatNumber, materialLabels, noteText, pitchText, resonatorLengthLabels } from "./format";
import { Treatment } from "./treatment-mark";

function Item({ label, children, testId }: { label: string; children: React.ReactNode; testId?: string }) {
  return (
    <div className="flex justify-between gap-4 border-b border-tin-rule/60 py-1 last:border-0">
      <dt className="text-ink-soft">{label}</dt>
      <dd className="num text-right" data-testid={testId}>{children}</dd>
    </div>
  );
}

const signed = (n: number) => (n > 0 ? `+${n}` : n < 0 ? `−${-n}` : "0");

/**
 * A stop's full details for a reader who does not edit (the workshop, the estimator): what it is,
 * how it is made and scaled, what happens to it, and what the estimator makes of it. Text, not a
 * greyed form.
 */
export function StopDetails({ stop, division, sourceName, figures }: { stop: DocStop; division: DocDivision; sourceName: string | null; figures: Figures | null }) {
  const est = figures?.ok ? figures.estimate.divisions.find((d) => d.id === division.id)?.stops.find((s) => s.id === stop.id) : undefined;
  return (
    <div className="grid gap-4 text-sm sm:grid-cols-2" data-testid="stop-details">
      <section aria-labelledby="stop-what">
        <h3 id="stop-what" className="label">The stop</h3>
        <dl>
          <Item label="Name">{stop.name}</Item>
          <Item label="Pitch" testId="detail-pitch">{pitchText(stop)}</Item>
          <Item label="Ranks">{stop.ranks}</Item>
          <Item label="Family">{familyLabels[stop.family]}</Item>
          <Item label="Division">{division.name}</Item>
          <Item label="Compass">{compassText(stop.compass ?? division.compass)}{stop.compass ? " (its own)" : ""}</Item>
          <Item label="Pipes and work" testId="detail-treatment"><Treatment stop={stop} /></Item>
          {sourceName && <Item label={stop.origin === "extension" ? "Extends" : "Draws on"}>{sourceName}</Item>}
          {stop.work.includes("rescaled") && stop.rescaleHt !== 0 && <Item label="Re-scaled by">{signed(stop.rescaleHt)} semitones</Item>}
          {stop.condition.length > 0 && <Item label="Survey found" testId="detail-condition">{stop.condition.map((f) => findingLabels[f]).join(", ")}</Item>}
          {stop.duplex && <Item label="Duplexed">also plays from a second keyboard</Item>}
        </dl>
      </section>
      <section aria-labelledby="stop-made">
        <h3 id="stop-made" className="label">How it is made</h3>
        <dl>
          <Item label="Construction" testId="detail-construction">{constructionLabels[stop.construction]}</Item>
          <Item label="Material" testId="detail-material">{materialLabels[stop.material]}</Item>
          {stop.resonator && <Item label="Resonators">{resonatorLengthLabels[stop.resonator.length]}, {stop.resonator.shape}</Item>}
          {stop.fluesFrom && <Item label="Flue pipes from">{noteText(stop.fluesFrom)}</Item>}
          {stop.bass && (
            <Item label="Basses" testId="detail-bass">
              lowest {stop.bass.notes} in {materialLabels[stop.bass.material].toLowerCase()}
              {stop.bass.construction ? `, ${constructionLabels[stop.bass.construction].toLowerCase()}` : ""}
            </Item>
          )}
          <Item label="Scale" testId="detail-scale">{signed(stop.scale.deviationHt)} semitones from normal</Item>
          <Item label="Diameter halves on">note {stop.scale.halvingOn}</Item>
          <Item label="Mouth width">{formatNumber(stop.scale.mouthWidth * 100, 1)} % of the circumference</Item>
          {stop.scale.cutUp !== undefined && <Item label="Cut-up">{formatNumber(stop.scale.cutUp * 100, 1)} % of the mouth width</Item>}
          {stop.offsetBassPipes > 0 && <Item label="Bass on an offset chest">lowest {stop.offsetBassPipes} pipes</Item>}
        </dl>
      </section>
      {stop.breaks && stop.breaks.length > 0 && (
        <section aria-labelledby="stop-breaks" className="sm:col-span-2">
          <h3 id="stop-breaks" className="label">Breaks</h3>
          <table className="w-full text-left">
            <thead className="text-xs text-tin">
              <tr><th className="py-1 pr-3 font-normal">From</th>{stop.breaks[0]!.footages.map((_, r) => <th key={r} className="py-1 pr-3 font-normal">Rank {r + 1}</th>)}</tr>
            </thead>
            <tbody>
              {stop.breaks.map((b, i) => (
                <tr key={i} className="border-t border-tin-rule/60">
                  <td className="py-1 pr-3">{noteText(b.from)}</td>
                  {b.footages.map((f, r) => <td key={r} className="num py-1 pr-3">{f === null ? <span title="silent from this note">–</span> : footageText(f)}</td>)}
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}
      {est && (
        <section aria-labelledby="stop-figures" className="sm:col-span-2">
          <h3 id="stop-figures" className="label">What the estimate makes of it</h3>
          <dl className="grid gap-x-6 sm:grid-cols-2">
            <Item label="Pipes" testId="detail-pipes">{formatNumber(est.pipes.total)} ({formatNumber(est.pipes.new)} new, {formatNumber(est.pipes.restored)} restored, {formatNumber(est.pipes.reused)} reused)</Item>
            <Item label="Notes">{formatNumber(est.notes)}</Item>
            {est.longestSpeakingLengthMm !== null && <Item label="Longest pipe speaks at">{formatNumber(Math.round(est.longestSpeakingLengthMm))} mm</Item>}
            {est.largestDiameterMm !== null && <Item label="Widest pipe">{formatNumber(Math.round(est.largestDiameterMm))} mm</Item>}
            {est.lowestFrequencyHz !== null && est.highestFrequencyHz !== null && (
              <Item label="Sounds">{formatNumber(est.lowestFrequencyHz, 1)} – {formatNumber(est.highestFrequencyHz, 0)} Hz</Item>
            )}
            {est.metalKg > 0 && <Item label="Pipe metal">{formatNumber(est.metalKg, 1)} kg</Item>}
            {est.woodM3 > 0 && <Item label="Board">{formatNumber(est.woodM3, 3)} m³</Item>}
            <Item label="Pipe work">{formatNumber(est.pipeHours, 0)} hours</Item>
          </dl>
        </section>
      )}
    </div>
  );
}
