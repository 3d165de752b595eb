"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { Controller, useForm } from "react-hook-form";
import { z } from "zod";
import { caseSchema, siteSchema, windSchema } from "@/lib/estimate/scheme";
import type { SchemeDocument } from "@/lib/spec/document";
import { materialLabels, workLabels } from "./format";
import { FieldError } from "@/components/ui/field-error";

/** The organ's work beyond its divisions, edited together: the case and its front, the wind system, the site. */
const worksSchema = z.object({ case: caseSchema, wind: windSchema, site: siteSchema });
type WorksIn = z.input<typeof worksSchema>;
export type Works = z.output<typeof worksSchema>;


const optionalNumber = (v: unknown) => (v === "" || v === null || v === undefined ? undefined : Number(v));
const lodging = (v: unknown) => (v === "yes" ? true : v === "no" ? false : undefined);

export function WorksEditor({ doc, editable, onApply }: { doc: SchemeDocument; editable: boolean; onApply: (works: Works) => void }) {
  const defaults: WorksIn = { case: doc.case, wind: doc.wind, site: doc.site };
  const form = useForm<WorksIn, unknown, Works>({ resolver: zodResolver(worksSchema), defaultValues: defaults });
  const { register, handleSubmit, formState, reset } = form;
  const err = formState.errors;
  const num = (field: Parameters<typeof register>[0]) => register(field, { setValueAs: optionalNumber });

  return (
    <form
      onSubmit={handleSubmit((w) => {
        onApply(w);
        reset(w);
      })}
      noValidate
      aria-label="Case, wind and site"
      className="space-y-4"
    >
      <fieldset disabled={!editable} className="space-y-4">
        <section className="panel grid gap-3 p-3 sm:grid-cols-4" data-testid="works-case">
          <h3 className="text-lg font-semibold sm:col-span-4">Case and front</h3>
          <div>
            <label className="label" htmlFor="case-work">Case</label>
            <select id="case-work" className="field" {...register("case.work")}>
              {(["new", "restored", "retained", "none"] as const).map((w) => <option key={w} value={w}>{workLabels[w]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="case-width">Width (mm)</label>
            <input id="case-width" type="number" min={1} placeholder="from the chests" className="field num" aria-invalid={!!err.case?.widthMm} {...num("case.widthMm")} />
            <FieldError error={err.case?.widthMm} />
          </div>
          <div>
            <label className="label" htmlFor="case-depth">Depth (mm)</label>
            <input id="case-depth" type="number" min={1} placeholder="from the chests" className="field num" aria-invalid={!!err.case?.depthMm} {...num("case.depthMm")} />
            <FieldError error={err.case?.depthMm} />
          </div>
          <div>
            <label className="label" htmlFor="case-height">Height (mm)</label>
            <input id="case-height" type="number" min={1} placeholder="from the pipes" className="field num" aria-invalid={!!err.case?.heightMm} {...num("case.heightMm")} />
            <FieldError error={err.case?.heightMm} />
          </div>
          <div>
            <label className="label" htmlFor="case-timber">Timber</label>
            <select id="case-timber" className="field" {...register("case.timber")}>
              {(["oak", "pine", "mahogany"] as const).map((t) => <option key={t} value={t}>{materialLabels[t]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="case-front">Speaking front pipes</label>
            <input id="case-front" type="number" min={0} className="field num" aria-invalid={!!err.case?.speakingFrontPipes} {...register("case.speakingFrontPipes", { valueAsNumber: true })} />
            <FieldError error={err.case?.speakingFrontPipes} />
          </div>
          <div>
            <label className="label" htmlFor="case-dummies">Dummy front pipes</label>
            <input id="case-dummies" type="number" min={0} className="field num" aria-invalid={!!err.case?.dummyPipes} {...register("case.dummyPipes", { valueAsNumber: true })} />
            <FieldError error={err.case?.dummyPipes} />
          </div>
          <div>
            <label className="label" htmlFor="case-dummy-length">their length (mm)</label>
            <input id="case-dummy-length" type="number" min={100} className="field num" aria-invalid={!!err.case?.dummyPipeLengthMm} {...register("case.dummyPipeLengthMm", { valueAsNumber: true })} />
            <FieldError error={err.case?.dummyPipeLengthMm} />
          </div>
          <div>
            <label className="label" htmlFor="case-metal">Front metal</label>
            <select id="case-metal" className="field" {...register("case.frontMetal")}>
              {(["high-tin", "spotted", "common", "zinc", "copper"] as const).map((m) => <option key={m} value={m}>{materialLabels[m]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="case-decoration">Carved decoration (m²)</label>
            <input id="case-decoration" type="number" min={0} step="any" className="field num" aria-invalid={!!err.case?.decorationM2} {...register("case.decorationM2", { valueAsNumber: true })} />
            <FieldError error={err.case?.decorationM2} />
          </div>
          <div>
            <label className="label" htmlFor="case-gilding">Gilding (m²)</label>
            <input id="case-gilding" type="number" min={0} step="any" className="field num" aria-invalid={!!err.case?.gildingM2} {...register("case.gildingM2", { valueAsNumber: true })} />
            <FieldError error={err.case?.gildingM2} />
          </div>
          <p className="text-xs text-tin sm:col-span-4">Sizes left blank are worked out round the chests and the tallest pipe. Casework is priced by its surface: front, sides and roof.</p>
        </section>

        <section className="panel grid gap-3 p-3 sm:grid-cols-3" data-testid="works-wind">
          <h3 className="text-lg font-semibold sm:col-span-3">Wind system</h3>
          <div>
            <label className="label" htmlFor="wind-work">Reservoirs and trunks</label>
            <select id="wind-work" className="field" {...register("wind.work")}>
              {(["new", "restored", "retained"] as const).map((w) => <option key={w} value={w}>{workLabels[w]}</option>)}
            </select>
          </div>
          <div>
            <label className="label" htmlFor="wind-blower">Blower</label>
            <select id="wind-blower" className="field" {...register("wind.blower")}>
              <option value="new">New, sized for the organ</option>
              <option value="retained">Existing one kept</option>
            </select>
          </div>
          <div>
            <label className="label" htmlFor="wind-trunk">Main trunk (m)</label>
            <input id="wind-trunk" type="number" min={0} step="any" placeholder="per division" className="field num" aria-invalid={!!err.wind?.trunkLengthM} {...num("wind.trunkLengthM")} />
            <FieldError error={err.wind?.trunkLengthM} />
          </div>
        </section>

        <section className="panel grid gap-3 p-3 sm:grid-cols-3" data-testid="works-site">
          <h3 className="text-lg font-semibold sm:col-span-3">Site</h3>
          <div>
            <label className="label" htmlFor="site-distance">Distance from the workshop (km)</label>
            <input id="site-distance" type="number" min={0} step="any" className="field num" aria-invalid={!!err.site?.distanceKm} {...register("site.distanceKm", { valueAsNumber: true })} />
            <FieldError error={err.site?.distanceKm} />
          </div>
          <div>
            <label className="label" htmlFor="site-lodging">Crew lodging</label>
            <Controller
              control={form.control}
              name="site.lodging"
              render={({ field }) => (
                <select id="site-lodging" className="field" value={field.value === undefined ? "" : field.value ? "yes" : "no"} onChange={(e) => field.onChange(lodging(e.target.value))} onBlur={field.onBlur}>
                  <option value="">By distance</option>
                  <option value="yes">Yes</option>
                  <option value="no">No</option>
                </select>
              )}
            />
          </div>
          <label className="inline-flex items-center gap-2 self-end pb-2 text-sm">
            <input type="checkbox" className="accent-brass" {...register("site.scaffold")} />
            Scaffolding for access
          </label>
          <p className="text-xs text-tin sm:col-span-3">
            Work at height and heavy lifts need planned access and competent, insured contractors under local health-and-safety regulations.
          </p>
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
