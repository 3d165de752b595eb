"use client";
import type { FieldErrors, UseFormRegister } from "react-hook-form";
import type { z } from "zod";
import { projectStatusLabels, projectStatuses, type projectInputSchema } from "@/lib/spec/projects";
import { FieldError } from "@/components/ui/field-error";

export type ProjectFormValues = z.input<typeof projectInputSchema>;
export const projectFieldNames = ["name", "clientName", "venue", "location", "instrument", "status", "targetDate", "pitchHz", "temperatureC", "notes"] as const;


/** The project's fields, shared by the new-project form and the details form. */
export function ProjectFields({
  register,
  errors,
  idPrefix,
  readOnly = false,
  compact = false,
}: {
  register: UseFormRegister<ProjectFormValues>;
  errors: FieldErrors<ProjectFormValues>;
  idPrefix: string;
  readOnly?: boolean;
  compact?: boolean;
}) {
  const id = (n: string) => `${idPrefix}-${n}`;
  const grid = compact ? "grid gap-3" : "grid gap-3 sm:grid-cols-2";
  return (
    <fieldset disabled={readOnly} className="space-y-3">
      <div className={grid}>
        <div>
          <label className="label" htmlFor={id("name")}>Project name</label>
          <input id={id("name")} className="field" aria-invalid={!!errors.name} {...register("name")} />
          <FieldError error={errors.name} />
        </div>
        <div>
          <label className="label" htmlFor={id("clientName")}>Client</label>
          <input id={id("clientName")} className="field" placeholder="Church, school, hall…" aria-invalid={!!errors.clientName} {...register("clientName")} />
          <FieldError error={errors.clientName} />
        </div>
        <div>
          <label className="label" htmlFor={id("venue")}>Venue</label>
          <input id={id("venue")} className="field" {...register("venue")} />
          <FieldError error={errors.venue} />
        </div>
        <div>
          <label className="label" htmlFor={id("location")}>Location</label>
          <input id={id("location")} className="field" {...register("location")} />
          <FieldError error={errors.location} />
        </div>
      </div>
      <div>
        <label className="label" htmlFor={id("instrument")}>Instrument</label>
        <input id={id("instrument")} className="field" placeholder="e.g. two manuals and pedal, 1890s, rebuilt once" {...register("instrument")} />
        <FieldError error={errors.instrument} />
      </div>
      <div className={compact ? "grid grid-cols-2 gap-3" : "grid gap-3 sm:grid-cols-4"}>
        <div>
          <label className="label" htmlFor={id("status")}>Status</label>
          <select id={id("status")} className="field" {...register("status")}>
            {projectStatuses.map((s) => <option key={s} value={s}>{projectStatusLabels[s]}</option>)}
          </select>
          <FieldError error={errors.status} />
        </div>
        <div>
          <label className="label" htmlFor={id("targetDate")}>Target completion</label>
          <input
            id={id("targetDate")}
            type="date"
            className="field num"
            aria-invalid={!!errors.targetDate}
            {...register("targetDate", { setValueAs: (v: unknown) => (v === "" || v == null ? null : v) })}
          />
          <FieldError error={errors.targetDate} />
        </div>
        <div>
          <label className="label" htmlFor={id("pitchHz")}>Pitch a′ (Hz)</label>
          <input id={id("pitchHz")} type="number" step="0.1" className="field num" aria-invalid={!!errors.pitchHz} {...register("pitchHz", { valueAsNumber: true })} />
          <FieldError error={errors.pitchHz} />
        </div>
        <div>
          <label className="label" htmlFor={id("temperatureC")}>Design temp. (°C)</label>
          <input id={id("temperatureC")} type="number" step="0.5" className="field num" aria-invalid={!!errors.temperatureC} {...register("temperatureC", { valueAsNumber: true })} />
          <FieldError error={errors.temperatureC} />
        </div>
      </div>
      <div>
        <label className="label" htmlFor={id("notes")}>Notes</label>
        <textarea id={id("notes")} rows={compact ? 2 : 3} className="field" {...register("notes")} />
        <FieldError error={errors.notes} />
      </div>
    </fieldset>
  );
}
