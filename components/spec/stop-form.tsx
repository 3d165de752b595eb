"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { Controller, useFieldArray, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { constructions, families, materials, stopSchema, treatments } from "@/lib/estimate/scheme";
import type { DocStop } from "@/lib/spec/document";
import { constructionLabels, familyLabels, isValidFootage, materialLabels, pitchText, treatmentLabels } from "./format";
import { stopPresets, type StopFields } from "./presets";

type StopIn = z.input<typeof stopSchema>;
type StopOut = z.output<typeof stopSchema>;

const FOOTAGE_HINT = "Not a footage: write a whole number of feet or a fraction, e.g. 8, 2 2/3 (or 2⅔), 1 3/5.";

function Err({ e }: { e?: { message?: string } }) {
  return e?.message ? <p className="field-error"><span aria-hidden="true">✕ </span>{e.message}</p> : null;
}

/** A comma-separated list of footages for one break of a mixture: "2, 1 1/3, 1". */
function FootageList({ value, onChange, id, invalid }: { value: unknown; onChange: (v: string[]) => void; id: string; invalid: boolean }) {
  const [text, setText] = useState(() => (Array.isArray(value) ? value.join(", ") : ""));
  return (
    <input
      id={id}
      className="field num"
      value={text}
      aria-invalid={invalid}
      onChange={(e) => {
        setText(e.target.value);
        onChange(e.target.value.split(",").map((s) => s.trim()).filter(Boolean));
      }}
    />
  );
}

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
  const start: StopIn = initial ?? { id: newId, name: "", footage: "8", ranks: 1, family: "principal", construction: "open", material: "spotted", treatment: "new", scale: { offsetHt: 0, halvingOn: 17, mouthWidth: 0.25 }, offsetBassPipes: 0 };
  const [ownCompass, setOwnCompass] = useState(!!initial?.compass);
  const [withBreaks, setWithBreaks] = useState(!!initial?.breaks?.length);
  const form = useForm<StopIn, unknown, StopOut>({ resolver: zodResolver(stopSchema), defaultValues: start, shouldUnregister: true });
  const { register, handleSubmit, control, formState, setError, reset } = form;
  const breaks = useFieldArray({ control, name: "breaks" });
  const [treatment, family, ranks, name, footage] = useWatch({ control, name: ["treatment", "family", "ranks", "name", "footage"] });
  const err = formState.errors;
  const needsSource = treatment === "extension" || treatment === "borrowed";

  function applyPreset(key: string) {
    const p = stopPresets.find((x) => x.key === key);
    if (!p) return;
    const fields: StopFields = p.stop;
    setOwnCompass(!!fields.compass);
    setWithBreaks(!!fields.breaks?.length);
    reset({ offsetBassPipes: 0, ranks: 1, treatment: treatment ?? "new", ...fields, id: initial?.id ?? newId });
  }

  const submit = handleSubmit((stop) => {
    let bad = false;
    if (!isValidFootage(stop.footage)) {
      setError("footage", { type: "validate", message: FOOTAGE_HINT });
      bad = true;
    }
    stop.breaks?.forEach((b, i) => {
      if (b.footages.length !== stop.ranks) {
        setError(`breaks.${i}.footages`, { type: "validate", message: `Give one footage for each of the ${stop.ranks} ranks.` });
        bad = true;
      } else if (!b.footages.every(isValidFootage)) {
        setError(`breaks.${i}.footages`, { type: "validate", message: FOOTAGE_HINT });
        bad = true;
      }
    });
    if (needsSource && !stop.source) {
      setError("source", { type: "validate", message: "Choose the stop whose rank it draws on." });
      bad = true;
    }
    if (!bad) onSubmit(stop);
  });

  const preview = name ? `${name} ${pitchText({ footage: footage ?? "", ranks: Number(ranks) || 1, family: family ?? "principal" })}` : "";

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
          <Err e={err.name} />
        </div>
        <div>
          <label className="label" htmlFor="stop-footage">Pitch (ft)</label>
          <input id="stop-footage" className="field num" aria-invalid={!!err.footage} aria-describedby="stop-footage-hint" {...register("footage")} />
          <Err e={err.footage} />
        </div>
        <div>
          <label className="label" htmlFor="stop-ranks">Ranks</label>
          <input id="stop-ranks" type="number" min={1} max={12} className="field num" aria-invalid={!!err.ranks} {...register("ranks", { valueAsNumber: true })} />
          <Err e={err.ranks} />
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
          <Err e={err.family} />
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
      <div className="grid gap-3 sm:grid-cols-2">
        <div>
          <label className="label" htmlFor="stop-treatment">Treatment</label>
          <select id="stop-treatment" className="field" {...register("treatment")}>
            {treatments.map((t) => <option key={t} value={t}>{treatmentLabels[t]}</option>)}
          </select>
        </div>
        {needsSource && (
          <div>
            <label className="label" htmlFor="stop-source">{treatment === "extension" ? "Extends the rank of" : "Borrowed from"}</label>
            <select id="stop-source" className="field" aria-invalid={!!err.source} {...register("source", { setValueAs: (v: unknown) => (v === "" ? undefined : v) })}>
              <option value="">— choose a stop —</option>
              {sources.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
            </select>
            <Err e={err.source} />
          </div>
        )}
      </div>
      <fieldset className="rounded border border-tin-rule p-3">
        <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-tin">Scale</legend>
        <div className="grid gap-3 sm:grid-cols-4">
          <div>
            <label className="label" htmlFor="stop-offset">Offset (semitones)</label>
            <input id="stop-offset" type="number" step="1" className="field num" aria-invalid={!!err.scale?.offsetHt} {...register("scale.offsetHt", { valueAsNumber: true })} />
            <Err e={err.scale?.offsetHt} />
          </div>
          <div>
            <label className="label" htmlFor="stop-halving">Halves on note</label>
            <input id="stop-halving" type="number" step="1" className="field num" aria-invalid={!!err.scale?.halvingOn} {...register("scale.halvingOn", { valueAsNumber: true })} />
            <Err e={err.scale?.halvingOn} />
          </div>
          <div>
            <label className="label" htmlFor="stop-mouth">Mouth width</label>
            <input id="stop-mouth" type="number" step="0.01" className="field num" aria-invalid={!!err.scale?.mouthWidth} {...register("scale.mouthWidth", { valueAsNumber: true })} />
            <Err e={err.scale?.mouthWidth} />
          </div>
          <div>
            <label className="label" htmlFor="stop-offsetbass">Basses offset</label>
            <input id="stop-offsetbass" type="number" min={0} max={32} className="field num" aria-invalid={!!err.offsetBassPipes} {...register("offsetBassPipes", { valueAsNumber: true })} />
            <Err e={err.offsetBassPipes} />
          </div>
        </div>
        <p className="mt-1 text-xs text-tin">Offset in semitones from the normal scale (+ wider); mouth width as a fraction of the circumference (¼ normal); basses offset: the lowest pipes on an offset chest.</p>
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
      </div>
      {ownCompass && (
        <div className="grid grid-cols-2 gap-3">
          <div>
            <label className="label" htmlFor="stop-low">Lowest note</label>
            <input id="stop-low" className="field num" defaultValue={initial?.compass?.low ?? "c"} aria-invalid={!!err.compass?.low} {...register("compass.low")} />
            <Err e={err.compass?.low} />
          </div>
          <div>
            <label className="label" htmlFor="stop-high">Highest note</label>
            <input id="stop-high" className="field num" defaultValue={initial?.compass?.high ?? "c''''"} aria-invalid={!!err.compass?.high} {...register("compass.high")} />
            <Err e={err.compass?.high} />
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
                  <Err e={err.breaks?.[i]?.from} />
                </div>
                <div>
                  <label className="sr-only" htmlFor={`break-footages-${i}`}>Break {i + 1} footages, comma-separated</label>
                  <Controller
                    control={control}
                    name={`breaks.${i}.footages`}
                    render={({ field }) => <FootageList id={`break-footages-${i}`} value={field.value} onChange={field.onChange} invalid={!!err.breaks?.[i]?.footages} />}
                  />
                  <Err e={err.breaks?.[i]?.footages} />
                </div>
                <button type="button" className="btn py-1" aria-label={`Remove break ${i + 1}`} onClick={() => breaks.remove(i)}>Remove</button>
              </div>
            ))}
          </div>
          <button type="button" className="btn mt-2 py-1 text-xs" onClick={() => breaks.append({ from: breaks.fields.length ? "c'" : "C", footages: [] })}>
            Add a break
          </button>
          <p className="mt-1 text-xs text-tin">Footages comma-separated, one per rank, highest first: 2, 1 1/3, 1.</p>
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
