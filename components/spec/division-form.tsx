"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { actions, chestTypes, divisionSchema } from "@/lib/estimate/scheme";
import type { DocDivision } from "@/lib/spec/document";
import { actionLabels, chestTypeLabels, workLabels } from "./format";
import { divisionPresets } from "./presets";

type DivIn = z.input<typeof divisionSchema>;
type DivOut = z.output<typeof divisionSchema>;

function Err({ e }: { e?: { message?: string } }) {
  return e?.message ? <p className="field-error"><span aria-hidden="true">✕ </span>{e.message}</p> : null;
}

export function DivisionForm({
  initial,
  newId,
  onSubmit,
  onCancel,
  onDelete,
}: {
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
  const form = useForm<DivIn, unknown, DivOut>({ resolver: zodResolver(divisionSchema), defaultValues: start, shouldUnregister: true });
  const { register, handleSubmit, formState, setValue, control } = form;
  const err = formState.errors;
  const enclosed = useWatch({ control, name: "enclosed" });

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label={initial ? `Edit division ${initial.name}` : "New division"} className="space-y-3">
      <input type="hidden" {...register("id")} />
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem]">
        <div>
          <label className="label" htmlFor="div-name">Name</label>
          <input id="div-name" className="field" placeholder="Great, Swell, Choir, Positive, Pedal…" aria-invalid={!!err.name} {...register("name")} />
          <Err e={err.name} />
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
          <input id="div-low" className="field num" aria-invalid={!!err.compass?.low} {...register("compass.low")} />
          <Err e={err.compass?.low} />
        </div>
        <div>
          <label className="label" htmlFor="div-high">to</label>
          <input id="div-high" className="field num" aria-invalid={!!err.compass?.high} {...register("compass.high")} />
          <Err e={err.compass?.high} />
        </div>
        <div>
          <label className="label" htmlFor="div-wind">Wind pressure</label>
          <input id="div-wind" type="number" step="any" className="field num" aria-invalid={!!err.windPressure?.value} {...register("windPressure.value", { valueAsNumber: true })} />
          <Err e={err.windPressure?.value} />
        </div>
        <div>
          <label className="label" htmlFor="div-wind-unit">Unit</label>
          <select id="div-wind-unit" className="field" {...register("windPressure.unit")}>
            <option value="mm">mm water</option>
            <option value="in">in water</option>
          </select>
        </div>
      </div>
      <p className="-mt-2 text-xs text-tin">Helmholtz names: manuals usually C to c′′′′ (c&apos;&apos;&apos;&apos;, 61 notes), pedals C to g′ (32) or f′ (30).</p>
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
          <Err e={err.consoleDistanceM} />
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
            <Err e={err.swellBox?.widthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-box-depth">inside depth in mm</label>
            <input id="div-box-depth" type="number" min={1} className="field num" defaultValue={initial?.swellBox?.depthMm} aria-invalid={!!err.swellBox?.depthMm} {...register("swellBox.depthMm", { valueAsNumber: true })} />
            <Err e={err.swellBox?.depthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-box-height">inside height in mm</label>
            <input id="div-box-height" type="number" min={1} className="field num" defaultValue={initial?.swellBox?.heightMm} aria-invalid={!!err.swellBox?.heightMm} {...register("swellBox.heightMm", { valueAsNumber: true })} />
            <Err e={err.swellBox?.heightMm} />
          </div>
        </div>
      )}
      {spaceKnown && (
        <div className="grid grid-cols-2 gap-3">
          <div>
            <label className="label" htmlFor="div-space-length">Space for the chest, length (mm)</label>
            <input id="div-space-length" type="number" min={1} className="field num" defaultValue={initial?.space?.lengthMm} aria-invalid={!!err.space?.lengthMm} {...register("space.lengthMm", { valueAsNumber: true })} />
            <Err e={err.space?.lengthMm} />
          </div>
          <div>
            <label className="label" htmlFor="div-space-depth">depth (mm)</label>
            <input id="div-space-depth" type="number" min={1} className="field num" defaultValue={initial?.space?.depthMm} aria-invalid={!!err.space?.depthMm} {...register("space.depthMm", { valueAsNumber: true })} />
            <Err e={err.space?.depthMm} />
          </div>
        </div>
      )}
      <div className="flex items-center gap-2 border-t border-tin-rule pt-3">
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
