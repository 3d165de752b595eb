"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { Controller, useFieldArray, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { accessoriesSchema } from "@/lib/estimate/scheme";
import type { SchemeDocument } from "@/lib/spec/document";
import { newId } from "./doc-ops";
import { couplerName, workLabels } from "./format";
import { FieldError } from "@/components/ui/field-error";

type AccIn = z.input<typeof accessoriesSchema>;
type AccOut = z.output<typeof accessoriesSchema>;


export function AccessoriesEditor({ doc, editable, onApply }: { doc: SchemeDocument; editable: boolean; onApply: (acc: AccOut) => void }) {
  const form = useForm<AccIn, unknown, AccOut>({ resolver: zodResolver(accessoriesSchema), defaultValues: doc.accessories });
  const { register, control, handleSubmit, formState, reset } = form;
  const couplers = useFieldArray({ control, name: "couplers" });
  const err = formState.errors;
  const divisions = doc.divisions;
  const values = useWatch({ control, name: "couplers" });

  return (
    <form
      onSubmit={handleSubmit((acc) => {
        onApply(acc);
        reset(acc);
      })}
      noValidate
      aria-label="Couplers and accessories"
      className="space-y-4"
    >
      <fieldset disabled={!editable} className="space-y-4">
        <section className="panel p-3">
          <h3 className="mb-2 text-lg font-semibold">Couplers</h3>
          {couplers.fields.length === 0 && <p className="text-sm text-tin">No couplers.</p>}
          <ul className="space-y-2">
            {couplers.fields.map((f, i) => (
              <li key={f.id} className="grid grid-cols-[1fr_1fr_9rem_auto] items-end gap-2" data-testid={`coupler-${i}`}>
                <input type="hidden" {...register(`couplers.${i}.id`)} />
                <div>
                  <label className="label" htmlFor={`cpl-from-${i}`}>From</label>
                  <select id={`cpl-from-${i}`} className="field" {...register(`couplers.${i}.from`)}>
                    {divisions.map((d) => <option key={d.id} value={d.id}>{d.name}</option>)}
                  </select>
                </div>
                <div>
                  <label className="label" htmlFor={`cpl-to-${i}`}>To</label>
                  <select id={`cpl-to-${i}`} className="field" {...register(`couplers.${i}.to`)}>
                    {divisions.map((d) => <option key={d.id} value={d.id}>{d.name}</option>)}
                  </select>
                </div>
                <div>
                  <label className="label" htmlFor={`cpl-oct-${i}`}>Pitch</label>
                  <select id={`cpl-oct-${i}`} className="field" {...register(`couplers.${i}.octave`, { setValueAs: (v: unknown) => Number(v) })}>
                    <option value={0}>Unison (8′)</option>
                    <option value={1}>Octave (4′)</option>
                    <option value={-1}>Sub octave (16′)</option>
                  </select>
                </div>
                <button type="button" className="btn" onClick={() => couplers.remove(i)} aria-label={`Remove coupler ${i + 1}`}>Remove</button>
                <p className="col-span-4 -mt-1 font-serif text-sm text-ink-soft">
                  {values?.[i] ? couplerName({ from: values[i].from, to: values[i].to, octave: (Number(values[i].octave ?? 0) as -1 | 0 | 1) }, divisions) : ""}
                </p>
                <div className="col-span-4"><FieldError error={err.couplers?.[i]?.from} /><FieldError error={err.couplers?.[i]?.to} /></div>
              </li>
            ))}
          </ul>
          {editable && divisions.length > 0 && (
            <button
              type="button"
              className="btn mt-2 text-xs"
              onClick={() => {
                const pedal = divisions.find((d) => d.keyboard === "pedal");
                const from = divisions.find((d) => d.keyboard === "manual") ?? divisions[0];
                couplers.append({ id: newId("cpl"), from: from.id, to: (pedal ?? divisions[0]).id, octave: 0 });
              }}
            >
              + Add coupler
            </button>
          )}
        </section>

        <section className="panel p-3">
          <h3 className="mb-2 text-lg font-semibold">Tremulants</h3>
          <Controller
            control={control}
            name="tremulants"
            render={({ field }) => {
              const list = field.value ?? [];
              return (
                <div className="flex flex-wrap gap-4 text-sm">
                  {divisions.map((d) => {
                    const on = list.some((t) => t.division === d.id);
                    return (
                      <label key={d.id} className="inline-flex items-center gap-2">
                        <input
                          type="checkbox"
                          className="accent-brass"
                          checked={on}
                          onChange={(e) =>
                            field.onChange(e.target.checked ? [...list, { id: newId("trem"), division: d.id }] : list.filter((t) => t.division !== d.id))
                          }
                        />
                        Tremulant to the {d.name}
                      </label>
                    );
                  })}
                  {divisions.length === 0 && <span className="text-tin">Add divisions first.</span>}
                </div>
              );
            }}
          />
        </section>

        <section className="panel grid gap-3 p-3 sm:grid-cols-4">
          <h3 className="text-lg font-semibold sm:col-span-4">Console and combination system</h3>
          <div>
            <label className="label" htmlFor="acc-console">Console</label>
            <select id="acc-console" className="field" {...register("consoleWork")}>
              {(["new", "restored", "retained"] as const).map((w) => <option key={w} value={w}>{workLabels[w]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="acc-levels">Memory levels</label>
            <input id="acc-levels" type="number" min={0} className="field num" aria-invalid={!!err.combination?.memoryLevels} {...register("combination.memoryLevels", { valueAsNumber: true })} />
            <FieldError error={err.combination?.memoryLevels} />
          </div>
          <div>
            <label className="label" htmlFor="acc-general">General pistons</label>
            <input id="acc-general" type="number" min={0} className="field num" aria-invalid={!!err.combination?.generalPistons} {...register("combination.generalPistons", { valueAsNumber: true })} />
            <FieldError error={err.combination?.generalPistons} />
          </div>
          <div>
            <label className="label" htmlFor="acc-divisional">Divisional pistons (each)</label>
            <input id="acc-divisional" type="number" min={0} className="field num" aria-invalid={!!err.combination?.divisionalPistons} {...register("combination.divisionalPistons", { valueAsNumber: true })} />
            <FieldError error={err.combination?.divisionalPistons} />
          </div>
        </section>
      </fieldset>
      {editable && (
        <div className="flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={!formState.isDirty}>Apply to the scheme</button>
          {formState.isDirty && <span className="text-sm text-caution">Not yet applied</span>}
        </div>
      )}
    </form>
  );
}
