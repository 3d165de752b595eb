"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { Controller, useFieldArray, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { constructions, families, findings, flueConstructions, materials, origins, pipeWorks, resonatorLengths, stopFormSchema } from "@/lib/estimate/scheme";
import type { DocStop } from "@/lib/spec/document";
import {
  constructionLabels, familyLabels, findingLabels, isValidFootage, materialLabels, originLabels, pipeWorkLabels, pitchText, resonatorLengthLabels,
} from "./format";
import { stopPresets, type StopFields } from "./presets";
import { FieldError } from "@/components/ui/field-error";

type StopIn = z.input<typeof stopFormSchema>;
type StopOut = z.output<typeof stopFormSchema>;

const FOOTAGE_HINT = "Not a footage: write a whole number of feet or a fraction, e.g. 8, 2 2/3 (or 2⅔), 1 3/5.";
const SILENT = "–";


/** A comma-separated list of footages for one break of a mixture: "2, 1 1/3, 1"; a dash for a rank silent there. */
function FootageList({ value, onChange, id, invalid }: { value: unknown; onChange: (v: (string | null)[]) => void; id: string; invalid: boolean }) {
  const [text, setText] = useState(() => (Array.isArray(value) ? value.map((f) => (f === null ? SILENT : f)).join(", ") : ""));
  return (
    <input
      id={id}
      className="field num"
      value={text}
      aria-invalid={invalid}
      onChange={(e) => {
        setText(e.target.value);
        onChange(e.target.value.split(",").map((s) => s.trim()).filter(Boolean).map((s) => (/^[-–—]$/.test(s) ? null : s)));
      }}
    />
  );
}

const optionalNumber = (v: unknown) => (v === "" || v === null || v === undefined ? undefined : Number(v));
const optionalText = (v: unknown) => (v === "" ? undefined : v);

export type SourceOption = { id: string; label: string };

export function StopForm({
  initial,
  newId,
  sources,
  onSubmit,
  onCancel,
  onDelete,
}: {
  initial?: DocStop;
  newId: string;
  /** Stops an extension or borrowing may draw on (not the stop itself). */
  sources: SourceOption[];
  onSubmit: (stop: StopOut) => void;
  onCancel: () => void;
  onDelete?: () => void;
}) {
  const start: StopIn = initial ?? {
    id: newId, name: "", footage: "8", ranks: 1, family: "principal", construction: "open", material: "spotted", origin: "new", work: [], condition: [],
    scale: { deviationHt: 0, halvingOn: 17, mouthWidth: 0.25 }, offsetBassPipes: 0,
  };
  const [ownCompass, setOwnCompass] = useState(!!initial?.compass);
  const [withBreaks, setWithBreaks] = useState(!!initial?.breaks?.length);
  const [withBass, setWithBass] = useState(!!initial?.bass);
  const form = useForm<StopIn, unknown, StopOut>({ resolver: zodResolver(stopFormSchema), defaultValues: start, shouldUnregister: true });
  const { register, handleSubmit, control, formState, setError, reset } = form;
  const breaks = useFieldArray({ control, name: "breaks" });
  const [origin, family, ranks, name, footage, construction, addedPipes, work, breakValues] = useWatch({
    control, name: ["origin", "family", "ranks", "name", "footage", "construction", "addedPipes", "work", "breaks"],
  });
  const err = formState.errors;
  const needsSource = origin === "extension" || origin === "borrowed";
  const existingPipes = origin === "existing" || (origin === "extension" && addedPipes === "existing");
  const works = Array.isArray(work) ? work : [];
  const reed = construction === "reed";
  const ownRank = origin === "new" || origin === "existing" || origin === "prepared";

  function applyPreset(key: string) {
    const p = stopPresets.find((x) => x.key === key);
    if (!p) return;
    const fields: StopFields = p.stop;
    setOwnCompass(!!fields.compass);
    setWithBreaks(!!fields.breaks?.length);
    setWithBass(!!fields.bass);
    reset({ offsetBassPipes: 0, ranks: 1, origin: origin ?? "new", work: [], condition: [], ...fields, id: initial?.id ?? newId });
  }

  const submit = handleSubmit((stop) => {
    let bad = false;
    if (!isValidFootage(stop.footage)) {
      setError("footage", { type: "validate", message: FOOTAGE_HINT });
      bad = true;
    }
    stop.breaks?.forEach((b, i) => {
      if (b.footages.length !== stop.ranks) {
        setError(`breaks.${i}.footages`, { type: "validate", message: `Give one footage (or ${SILENT} for a silent rank) for each of the ${stop.ranks} ranks.` });
        bad = true;
      } else if (!b.footages.every((f) => f === null || isValidFootage(f))) {
        setError(`breaks.${i}.footages`, { type: "validate", message: FOOTAGE_HINT });
        bad = true;
      }
    });
    if (needsSource && !stop.source) {
      setError("source", { type: "validate", message: "Choose the stop whose rank it draws on." });
      bad = true;
    }
    if (stop.work.includes("rescaled") && stop.rescaleHt === 0) {
      setError("rescaleHt", { type: "validate", message: "Give the semitones the pipes move: + up (wider), − down (narrower)." });
      bad = true;
    }
    if (!bad) onSubmit(stop);
  });

  const preview = name ? `${name} ${pitchText({ footage: footage ?? "", ranks: Number(ranks) || 1, family: family ?? "principal", breaks: withBreaks ? breakValues : undefined })}` : "";

  return (
    <form onSubmit={submit} noValidate aria-label={initial ? `Edit stop ${initial.name}` : "New stop"} className="space-y-3">
      <input type="hidden" {...register("id")} />
      <div>
        <label className="label" htmlFor="stop-preset">Start from a common stop</label>
        <select id="stop-preset" className="field" defaultValue="" onChange={(e) => applyPreset(e.target.value)}>
          <option value="">—</option>
          {[...new Set(stopPresets.map((p) => p.group))].map((g) => (
            <optgroup key={g} label={g}>
              {stopPresets.filter((p) => p.group === g).map((p) => <option key={p.key} value={p.key}>{p.label}</option>)}
            </optgroup>
          ))}
        </select>
      </div>
      <div className="grid gap-3 sm:grid-cols-[1fr_7rem_5rem]">
        <div>
          <label className="label" htmlFor="stop-name">Name</label>
          <input id="stop-name" className="field" aria-invalid={!!err.name} {...register("name")} />
          <FieldError error={err.name} />
        </div>
        <div>
          <label className="label" htmlFor="stop-footage">Pitch (ft)</label>
          <input id="stop-footage" className="field num" aria-invalid={!!err.footage} aria-describedby="stop-footage-hint" {...register("footage")} />
          <FieldError error={err.footage} />
        </div>
        <div>
          <label className="label" htmlFor="stop-ranks">Ranks</label>
          <input id="stop-ranks" type="number" min={1} max={12} className="field num" aria-invalid={!!err.ranks} {...register("ranks", { valueAsNumber: true })} />
          <FieldError error={err.ranks} />
        </div>
      </div>
      <p id="stop-footage-hint" className="-mt-2 text-xs text-tin">
        8, 4, 2 2/3 or 2⅔, 1 3/5… {preview && <>Shown as <strong className="font-serif text-sm text-ink">{preview}</strong>.</>}
      </p>
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <label className="label" htmlFor="stop-family">Family</label>
          <select id="stop-family" className="field" {...register("family")}>
            {families.map((f) => <option key={f} value={f}>{familyLabels[f]}</option>)}
          </select>
          <FieldError error={err.family} />
        </div>
        <div>
          <label className="label" htmlFor="stop-construction">Construction</label>
          <select id="stop-construction" className="field" {...register("construction")}>
            {constructions.map((c) => <option key={c} value={c}>{constructionLabels[c]}</option>)}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="stop-material">Material</label>
          <select id="stop-material" className="field" {...register("material")}>
            {materials.map((m) => <option key={m} value={m}>{materialLabels[m]}</option>)}
          </select>
        </div>
      </div>

      <fieldset className="rounded border border-tin-rule p-3">
        <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-tin">Pipes and work</legend>
        <div className="grid gap-3 sm:grid-cols-3">
          <div>
            <label className="label" htmlFor="stop-origin">Pipes</label>
            <select id="stop-origin" className="field" {...register("origin")}>
              {origins.map((o) => <option key={o} value={o}>{originLabels[o]}</option>)}
            </select>
          </div>
          {needsSource && (
            <div>
              <label className="label" htmlFor="stop-source">{origin === "extension" ? "Extends the rank of" : "Borrowed from"}</label>
              <select id="stop-source" className="field" aria-invalid={!!err.source} {...register("source", { setValueAs: optionalText })}>
                <option value="">— choose a stop —</option>
                {sources.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
              </select>
              <FieldError error={err.source} />
            </div>
          )}
          {origin === "extension" && (
            <div>
              <label className="label" htmlFor="stop-added">The notes it adds</label>
              <select id="stop-added" className="field" {...register("addedPipes")}>
                <option value="new">New pipes</option>
                <option value="existing">Existing pipes</option>
              </select>
            </div>
          )}
        </div>
        {existingPipes && (
          <div className="mt-2 space-y-2" data-testid="stop-work">
            <p className="text-xs text-tin">Work on the existing pipes (none ticked: cleaned and kept as they are):</p>
            <div className="flex flex-wrap gap-4 text-sm">
              {pipeWorks.map((w) => (
                <label key={w} className="inline-flex items-center gap-2">
                  <input type="checkbox" className="accent-brass" value={w} {...register("work")} />
                  {pipeWorkLabels[w]}
                </label>
              ))}
            </div>
            {works.includes("rescaled") && (
              <div className="w-48">
                <label className="label" htmlFor="stop-rescale">Pipes move (semitones)</label>
                <input id="stop-rescale" type="number" step="1" min={-12} max={12} className="field num" aria-invalid={!!err.rescaleHt} {...register("rescaleHt", { valueAsNumber: true })} />
                <FieldError error={err.rescaleHt} />
              </div>
            )}
            {works.includes("restored") && (
              <div>
                <p className="text-xs text-tin">What the survey found (chooses the restoration norm; none ticked: sound):</p>
                <div className="mt-1 grid gap-1 text-sm sm:grid-cols-2">
                  {findings.map((f) => (
                    <label key={f} className="inline-flex items-center gap-2">
                      <input type="checkbox" className="accent-brass" value={f} {...register("condition")} />
                      {findingLabels[f]}
                    </label>
                  ))}
                </div>
              </div>
            )}
          </div>
        )}
        {ownRank && (
          <label className="mt-2 inline-flex items-center gap-2 text-sm">
            <input type="checkbox" className="accent-brass" {...register("duplex")} />
            Duplexed: its slider chest lets a second keyboard play it
          </label>
        )}
      </fieldset>

      {reed && (
        <fieldset className="rounded border border-tin-rule p-3">
          <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-tin">Reed</legend>
          <div className="grid gap-3 sm:grid-cols-3">
            <div>
              <label className="label" htmlFor="stop-res-length">Resonator</label>
              <select id="stop-res-length" className="field" {...register("resonator.length")}>
                {resonatorLengths.map((l) => <option key={l} value={l}>{resonatorLengthLabels[l]}</option>)}
              </select>
            </div>
            <div>
              <label className="label" htmlFor="stop-res-shape">Resonator shape</label>
              <select id="stop-res-shape" className="field" {...register("resonator.shape")}>
                <option value="conical">Conical</option>
                <option value="cylindrical">Cylindrical</option>
              </select>
            </div>
            <div>
              <label className="label" htmlFor="stop-flues-from">Flue trebles from</label>
              <input id="stop-flues-from" className="field num" placeholder="e.g. c'''" aria-invalid={!!err.fluesFrom} {...register("fluesFrom", { setValueAs: optionalText })} />
              <FieldError error={err.fluesFrom} />
            </div>
          </div>
        </fieldset>
      )}

      <fieldset className="rounded border border-tin-rule p-3">
        <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-tin">Scale</legend>
        <div className="grid gap-3 sm:grid-cols-5">
          <div>
            <label className="label" htmlFor="stop-deviation">Deviation</label>
            <input id="stop-deviation" type="number" step="any" className="field num" aria-invalid={!!err.scale?.deviationHt} {...register("scale.deviationHt", { valueAsNumber: true })} />
            <FieldError error={err.scale?.deviationHt} />
          </div>
          <div>
            <label className="label" htmlFor="stop-halving">Halves on note</label>
            <input id="stop-halving" type="number" step="1" className="field num" aria-invalid={!!err.scale?.halvingOn} {...register("scale.halvingOn", { valueAsNumber: true })} />
            <FieldError error={err.scale?.halvingOn} />
          </div>
          <div>
            <label className="label" htmlFor="stop-mouth">Mouth width</label>
            <input id="stop-mouth" type="number" step="0.01" className="field num" aria-invalid={!!err.scale?.mouthWidth} {...register("scale.mouthWidth", { valueAsNumber: true })} />
            <FieldError error={err.scale?.mouthWidth} />
          </div>
          <div>
            <label className="label" htmlFor="stop-cutup">Cut-up</label>
            <input id="stop-cutup" type="number" step="0.01" placeholder="usual" className="field num" aria-invalid={!!err.scale?.cutUp} {...register("scale.cutUp", { setValueAs: optionalNumber })} />
            <FieldError error={err.scale?.cutUp} />
          </div>
          <div>
            <label className="label" htmlFor="stop-offsetbass">Basses offset</label>
            <input id="stop-offsetbass" type="number" min={0} max={32} className="field num" aria-invalid={!!err.offsetBassPipes} {...register("offsetBassPipes", { valueAsNumber: true })} />
            <FieldError error={err.offsetBassPipes} />
          </div>
        </div>
        <p className="mt-1 text-xs text-tin">
          Deviation in semitones from the normal scale at the stop&apos;s own C (+ wider); mouth width as a fraction of the circumference (¼ normal; wooden
          mouths span the pipe&apos;s width); cut-up as a fraction of the mouth width (blank: the firm&apos;s usual one for the family); basses offset: the
          lowest pipes on an offset chest.
        </p>
      </fieldset>
      <div className="flex flex-wrap gap-4 text-sm">
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" className="accent-brass" checked={ownCompass} onChange={(e) => setOwnCompass(e.target.checked)} />
          Compass of its own (e.g. from tenor c)
        </label>
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" className="accent-brass" checked={withBreaks} onChange={(e) => setWithBreaks(e.target.checked)} />
          Breaks (mixtures, cornets)
        </label>
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" className="accent-brass" checked={withBass} onChange={(e) => setWithBass(e.target.checked)} />
          Basses of another material
        </label>
      </div>
      {withBass && (
        <div className="grid grid-cols-3 gap-3" data-testid="stop-bass">
          <div>
            <label className="label" htmlFor="stop-bass-notes">Lowest notes</label>
            <input id="stop-bass-notes" type="number" min={1} max={61} className="field num" defaultValue={initial?.bass?.notes ?? 12} aria-invalid={!!err.bass?.notes} {...register("bass.notes", { valueAsNumber: true })} />
            <FieldError error={err.bass?.notes} />
          </div>
          <div>
            <label className="label" htmlFor="stop-bass-material">of</label>
            <select id="stop-bass-material" className="field" defaultValue={initial?.bass?.material ?? "zinc"} {...register("bass.material")}>
              {materials.map((m) => <option key={m} value={m}>{materialLabels[m]}</option>)}
            </select>
          </div>
          {!reed && (
            <div>
              <label className="label" htmlFor="stop-bass-construction">built</label>
              <select id="stop-bass-construction" className="field" defaultValue={initial?.bass?.construction ?? ""} {...register("bass.construction", { setValueAs: optionalText })}>
                <option value="">as the stop</option>
                {flueConstructions.map((c) => <option key={c} value={c}>{constructionLabels[c]}</option>)}
              </select>
            </div>
          )}
        </div>
      )}
      {ownCompass && (
        <div className="grid grid-cols-2 gap-3">
          <div>
            <label className="label" htmlFor="stop-low">Lowest note</label>
            <input id="stop-low" className="field num" defaultValue={initial?.compass?.low ?? "c"} aria-invalid={!!err.compass?.low} {...register("compass.low")} />
            <FieldError error={err.compass?.low} />
          </div>
          <div>
            <label className="label" htmlFor="stop-high">Highest note</label>
            <input id="stop-high" className="field num" defaultValue={initial?.compass?.high ?? "c''''"} aria-invalid={!!err.compass?.high} {...register("compass.high")} />
            <FieldError error={err.compass?.high} />
          </div>
        </div>
      )}
      {withBreaks && (
        <fieldset className="rounded border border-tin-rule p-3">
          <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-tin">Breaks: from a note upward, each rank&apos;s footage</legend>
          <div className="space-y-2">
            {breaks.fields.map((f, i) => (
              <div key={f.id} className="grid grid-cols-[6rem_1fr_auto] items-start gap-2">
                <div>
                  <label className="sr-only" htmlFor={`break-from-${i}`}>Break {i + 1} from note</label>
                  <input id={`break-from-${i}`} className="field num" placeholder="c'" aria-invalid={!!err.breaks?.[i]?.from} {...register(`breaks.${i}.from`)} />
                  <FieldError error={err.breaks?.[i]?.from} />
                </div>
                <div>
                  <label className="sr-only" htmlFor={`break-footages-${i}`}>Break {i + 1} footages, comma-separated</label>
                  <Controller
                    control={control}
                    name={`breaks.${i}.footages`}
                    render={({ field }) => <FootageList id={`break-footages-${i}`} value={field.value} onChange={field.onChange} invalid={!!err.breaks?.[i]?.footages} />}
                  />
                  <FieldError error={err.breaks?.[i]?.footages} />
                </div>
                <button type="button" className="btn py-1" aria-label={`Remove break ${i + 1}`} onClick={() => breaks.remove(i)}>Remove</button>
              </div>
            ))}
          </div>
          <button type="button" className="btn mt-2 py-1 text-xs" onClick={() => breaks.append({ from: breaks.fields.length ? "c'" : "C", footages: [] })}>
            Add a break
          </button>
          <p className="mt-1 text-xs text-tin">Footages comma-separated, one per rank, highest first: 2, 1 1/3, 1. A dash ({SILENT}) for a rank that starts higher up (a progressive mixture, III–V).</p>
        </fieldset>
      )}
      <div className="flex items-center gap-2 border-t border-tin-rule pt-3">
        <button type="submit" className="btn-primary">{initial ? "Apply" : "Add stop"}</button>
        <button type="button" className="btn" onClick={onCancel}>Cancel</button>
        {onDelete && (
          <button type="button" className="btn ml-auto text-clash" onClick={onDelete}>
            Delete stop
          </button>
        )}
      </div>
    </form>
  );
}
