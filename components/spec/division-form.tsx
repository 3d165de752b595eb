"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo, useState } from "react";
import { set, useForm, useWatch, type FieldErrors, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { FieldError, FieldWarning } from "@/components/ui/field-error";
import { StateMark } from "@/components/ui/state-mark";
import { actions, chestTypes, divisionSchema } from "@/lib/estimate/scheme";
import type { DocDivision, SchemeDocument } from "@/lib/spec/document";
import { divisionWarnings } from "@/lib/spec/plausibility";
import { checkDivisionInDocument } from "@/lib/spec/validate";
import { actionLabels, chestTypeLabels, workLabels } from "./format";
import { divisionPresets } from "./presets";

type DivIn = z.input<typeof divisionSchema>;
type DivOut = z.output<typeof divisionSchema>;

/**
 * The form checks what the server checks: the division's schema, then the estimator's consistency
 * rules on the scheme with this division in place (lib/spec/validate.ts), so a reversed compass is
 * said beside the compass and the form stays open, rather than a 422 after it closed.
 */
function divisionResolver(doc: SchemeDocument, stops: DocDivision["stops"], onStops: (problems: string[]) => void): Resolver<DivIn, unknown, DivOut> {
  const base = zodResolver(divisionSchema);
  return async (values, context, options) => {
    const result = await base(values, context, options);
    onStops([]);
    if (Object.keys(result.errors).length) return result;
    const checked = checkDivisionInDocument(doc, { ...(result.values as DivOut), stops });
    const errors: FieldErrors<DivIn> = {};
    for (const [path, messages] of Object.entries(checked.fields)) set(errors, path, { type: "consistency", message: messages.join(" ") });
    // Problems the division would cause in its stops are listed under the form; they keep it open too.
    if (checked.stops.length) set(errors, "stops", { type: "consistency", message: checked.stops.join(" ") });
    onStops(checked.stops);
    return Object.keys(errors).length ? { values: {}, errors } : result;
  };
}

export function DivisionForm({
  doc,
  initial,
  newId,
  onSubmit,
  onCancel,
  onDelete,
}: {
  /** The scheme as it stands, to check the division in place. */
  doc: SchemeDocument;
  initial?: DocDivision;
  newId: string;
  onSubmit: (division: DivOut) => void;
  onCancel: () => void;
  onDelete?: () => void;
}) {
  const start: DivIn = initial ?? {
    id: newId,
    name: "",
    ...divisionPresets.manual,
    compass: { ...divisionPresets.manual.compass },
    action: "mechanical",
    chest: "slider",
    chestLayout: "c-c-sharp",
    windPressure: { value: 80, unit: "mm" },
    enclosed: false,
    consoleDistanceM: 10,
    passageBoard: true,
    chestWork: "new",
    stops: [],
  };
  const [spaceKnown, setSpaceKnown] = useState(!!initial?.space);
  const [boxKnown, setBoxKnown] = useState(!!initial?.swellBox);
  const [stopProblems, setStopProblems] = useState<string[]>([]);
  const stops = initial?.stops ?? [];
  const resolver = useMemo(() => divisionResolver(doc, initial?.stops ?? [], setStopProblems), [doc, initial]);
  const form = useForm<DivIn, unknown, DivOut>({ resolver, defaultValues: start, shouldUnregister: true });
  const { register, handleSubmit, formState, setValue, control } = form;
  const err = formState.errors;
  const enclosed = useWatch({ control, name: "enclosed" });
  // Legal but unusual values: said under their fields as they are typed, and asked about once on Apply.
  const watched = useWatch({ control }) as DivIn;
  const warnings = divisionWarnings({ ...watched, windPressure: watched.windPressure as { value: number; unit?: "mm" | "in" } | undefined, stops });
  const warningOf = (field: string) => warnings.filter((w) => w.field === field).map((w) => w.message).join(" ") || null;
  const stopWarnings = warnings.filter((w) => w.field === "stops");
  const warningKey = warnings.map((w) => w.message).join("|");
  // The values that were about to be applied while the warnings are asked about.
  const [asked, setAsked] = useState<{ key: string; values: DivOut } | null>(null);
  const submit = handleSubmit((division) => {
    if (warningKey && asked?.key !== warningKey) {
      setAsked({ key: warningKey, values: division });
      return;
    }
    onSubmit(division);
  });
  const confirming = !!warningKey && asked?.key === warningKey ? asked : null;

  return (
    <form onSubmit={submit} noValidate aria-label={initial ? `Edit division ${initial.name}` : "New division"} className="space-y-3">
      <input type="hidden" {...register("id")} />
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem]">
        <div>
          <label className="label" htmlFor="div-name">Name</label>
          <input id="div-name" className="field" placeholder="Great, Swell, Choir, Positive, Pedal…" aria-invalid={!!err.name} {...register("name")} />
          <FieldError error={err.name} />
        </div>
        <div>
          <label className="label" htmlFor="div-keyboard">Played from</label>
          <select
            id="div-keyboard"
            className="field"
            {...register("keyboard", {
              onChange: (e: { target: { value: "manual" | "pedal" } }) => {
                // A new division takes the usual compass of its keyboard; an existing one keeps its own.
                if (!initial) {
                  const c = divisionPresets[e.target.value].compass;
                  setValue("compass.low", c.low);
                  setValue("compass.high", c.high);
                }
              },
            })}
          >
            <option value="manual">A manual</option>
            <option value="pedal">The pedals</option>
          </select>
        </div>
      </div>
      <div className="grid gap-3 sm:grid-cols-4">
        <div>
          <label className="label" htmlFor="div-low">Compass from</label>
          <input id="div-low" className="field num" aria-invalid={!!(err.compass?.low || err.compass?.message)} aria-describedby="div-compass-error" {...register("compass.low")} />
          <FieldError error={err.compass?.low} />
        </div>
        <div>
          <label className="label" htmlFor="div-high">to</label>
          <input id="div-high" className="field num" aria-invalid={!!(err.compass?.high || err.compass?.message)} aria-describedby="div-compass-error div-compass-warning" {...register("compass.high")} />
          <FieldError error={err.compass?.high} />
        </div>
        <div>
          <label className="label" htmlFor="div-wind">Wind pressure</label>
          <input id="div-wind" type="number" step="any" className="field num" aria-invalid={!!err.windPressure?.value} aria-describedby="div-wind-warning" {...register("windPressure.value", { valueAsNumber: true })} />
          <FieldError error={err.windPressure?.value} />
        </div>
        <div>
          <label className="label" htmlFor="div-wind-unit">Unit</label>
          <select id="div-wind-unit" className="field" {...register("windPressure.unit")}>
            <option value="mm">mm water</option>
            <option value="in">in water</option>
          </select>
        </div>
      </div>
      <FieldError id="div-compass-error" error={err.compass?.message ? err.compass : undefined} />
      {!err.windPressure?.value && <FieldWarning id="div-wind-warning" message={warningOf("windPressure.value")} />}
      {!err.compass && <FieldWarning id="div-compass-warning" message={warningOf("compass.high")} />}
      <p className="text-xs text-tin">Helmholtz names: manuals usually C to c′′′′ (c&apos;&apos;&apos;&apos;, 61 notes), pedals C to g′ (32) or f′ (30).</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <label className="label" htmlFor="div-action">Action</label>
          <select id="div-action" className="field" {...register("action")}>
            {actions.map((a) => <option key={a} value={a}>{actionLabels[a]}</option>)}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="div-chest">Chest</label>
          <select id="div-chest" className="field" {...register("chest")}>
            {chestTypes.map((c) => <option key={c} value={c}>{chestTypeLabels[c]}</option>)}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="div-layout">Chest layout</label>
          <select id="div-layout" className="field" {...register("chestLayout")}>
            <option value="c-c-sharp">C and C♯ sides</option>
            <option value="chromatic">Chromatic</option>
          </select>
        </div>
        <div>
          <label className="label" htmlFor="div-chestwork">Chests and action</label>
          <select id="div-chestwork" className="field" {...register("chestWork")}>
            {(["new", "restored", "retained"] as const).map((w) => <option key={w} value={w}>{workLabels[w]}</option>)}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="div-distance">Cable run to console (m)</label>
          <input id="div-distance" type="number" step="0.5" min={0} className="field num" aria-invalid={!!err.consoleDistanceM} {...register("consoleDistanceM", { valueAsNumber: true })} />
          <FieldError error={err.consoleDistanceM} />
        </div>
      </div>
      <div className="flex flex-wrap gap-4 text-sm">
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" className="accent-brass" {...register("enclosed")} />
          Enclosed in a swell box
        </label>
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" className="accent-brass" {...register("passageBoard")} />
          Passage board for tuning
        </label>
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" className="accent-brass" checked={spaceKnown} onChange={(e) => setSpaceKnown(e.target.checked)} />
          Space in the case is known
        </label>
      </div>
      {enclosed && (
        <label className="inline-flex items-center gap-2 text-sm">
          <input type="checkbox" className="accent-brass" checked={boxKnown} onChange={(e) => setBoxKnown(e.target.checked)} />
          Swell box size is known (otherwise sized round the chest and its tallest pipe)
        </label>
      )}
      {enclosed && boxKnown && (
        <div className="grid grid-cols-3 gap-3" data-testid="swell-box-size">
          <div>
            <label className="label" htmlFor="div-box-width">Swell box inside width in mm</label>
            <input id="div-box-width" type="number" min={1} className="field num" defaultValue={initial?.swellBox?.widthMm} aria-invalid={!!err.swellBox?.widthMm} {...register("swellBox.widthMm", { valueAsNumber: true })} />
            <FieldError error={err.swellBox?.widthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-box-depth">inside depth in mm</label>
            <input id="div-box-depth" type="number" min={1} className="field num" defaultValue={initial?.swellBox?.depthMm} aria-invalid={!!err.swellBox?.depthMm} {...register("swellBox.depthMm", { valueAsNumber: true })} />
            <FieldError error={err.swellBox?.depthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-box-height">inside height in mm</label>
            <input id="div-box-height" type="number" min={1} className="field num" defaultValue={initial?.swellBox?.heightMm} aria-invalid={!!err.swellBox?.heightMm} {...register("swellBox.heightMm", { valueAsNumber: true })} />
            <FieldError error={err.swellBox?.heightMm} />
          </div>
        </div>
      )}
      {spaceKnown && (
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          <div>
            <label className="label" htmlFor="div-space-length">Space for the chest, length (mm)</label>
            <input id="div-space-length" type="number" min={1} className="field num" defaultValue={initial?.space?.lengthMm} aria-invalid={!!err.space?.lengthMm} {...register("space.lengthMm", { valueAsNumber: true })} />
            <FieldError error={err.space?.lengthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-space-depth">depth (mm)</label>
            <input id="div-space-depth" type="number" min={1} className="field num" defaultValue={initial?.space?.depthMm} aria-invalid={!!err.space?.depthMm} {...register("space.depthMm", { valueAsNumber: true })} />
            <FieldError error={err.space?.depthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-space-height">clear height above the chest (mm, optional)</label>
            <input id="div-space-height" type="number" min={1} className="field num" defaultValue={initial?.space?.heightMm} aria-invalid={!!err.space?.heightMm}
              {...register("space.heightMm", { setValueAs: (v: unknown) => (v === "" || v === null || v === undefined ? undefined : Number(v)) })} />
            <FieldError error={err.space?.heightMm} />
          </div>
        </div>
      )}
      {stopProblems.length > 0 && (
        <div role="alert" className="rounded border border-clash bg-clash-light px-3 py-2 text-sm" data-testid="division-stop-problems">
          <p className="flex items-center gap-1.5 font-semibold text-clash"><StateMark kind="clash" />With these values, stops of this division would not be valid:</p>
          <ul className="mt-1 list-disc pl-6">{stopProblems.map((m, i) => <li key={i}>{m}</li>)}</ul>
        </div>
      )}
      {stopWarnings.length > 0 && (
        <div className="rounded border border-caution/60 bg-caution-light px-3 py-2 text-xs text-ink">
          <ul className="list-disc space-y-0.5 pl-5">{stopWarnings.map((w, i) => <li key={i}>{w.message}</li>)}</ul>
        </div>
      )}
      {confirming && (
        <div role="alert" className="rounded border border-caution bg-caution-light px-3 py-2 text-sm" data-testid="division-warnings">
          <p className="flex items-center gap-1.5 font-semibold"><StateMark kind="caution" className="text-caution" />Some values are unusual (see above). Keep them?</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" className="btn-primary" onClick={() => onSubmit(confirming.values)}>Keep these values and apply</button>
            <button type="button" className="btn" onClick={() => setAsked(null)}>Let me change them</button>
          </div>
        </div>
      )}
      <div className="flex flex-wrap items-center gap-2 border-t border-tin-rule pt-3">
        <button type="submit" className="btn-primary">{initial ? "Apply" : "Add division"}</button>
        <button type="button" className="btn" onClick={onCancel}>Cancel</button>
        {onDelete && (
          <button type="button" className="btn ml-auto text-clash" onClick={onDelete}>
            Delete division
          </button>
        )}
      </div>
    </form>
  );
}
