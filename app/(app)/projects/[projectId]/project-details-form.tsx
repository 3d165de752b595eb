"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { ApiError } from "@/components/spec/api";
import { useUpdateProject } from "@/lib/query/hooks";
import { StateMark } from "@/components/ui/state-mark";
import { applyServerErrors } from "@/components/ui/server-errors";
import { projectInputSchema, type ProjectRead } from "@/lib/spec/projects";
import { ProjectFields, projectFieldNames, type ProjectFormValues } from "../project-fields";

function valuesOf(p: ProjectRead): ProjectFormValues {
  return {
    name: p.name, clientName: p.clientName, venue: p.venue, location: p.location, instrument: p.instrument,
    status: p.status, targetDate: p.targetDate, pitchHz: p.pitchHz, temperatureC: p.temperatureC, notes: p.notes,
  };
}

export function ProjectDetailsForm({ project, readOnly }: { project: ProjectRead; readOnly: boolean }) {
  const update = useUpdateProject(project.id);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<ProjectFormValues, unknown, z.output<typeof projectInputSchema>>({
    resolver: zodResolver(projectInputSchema),
    defaultValues: valuesOf(project),
  });

  const onSubmit = form.handleSubmit(async (values) => {
    setNotice(null);
    try {
      const { project: saved } = await update.mutateAsync(values);
      form.reset(valuesOf(saved));
      setNotice({ ok: true, text: "Details saved." });
    } catch (err) {
      if (err instanceof ApiError) {
        const rest = applyServerErrors(form.setError, err.fields, projectFieldNames);
        setNotice({ ok: false, text: [err.message, ...rest].join(" ") });
      } else setNotice({ ok: false, text: "The details could not be saved." });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Project details" className="space-y-3">
      <ProjectFields register={form.register} errors={form.formState.errors} idPrefix="project" readOnly={readOnly} />
      {!readOnly && (
        <div className="flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={form.formState.isSubmitting || !form.formState.isDirty}>
            {form.formState.isSubmitting ? "Saving…" : "Save details"}
          </button>
          {form.formState.isDirty && !form.formState.isSubmitting && (
            <span className="inline-flex items-center gap-1 text-sm text-caution"><StateMark kind="unsaved" />Unsaved changes</span>
          )}
          {notice && (
            <p role="status" className={`inline-flex items-center gap-1 text-sm ${notice.ok ? "text-fit" : "text-clash"}`}>
              <StateMark kind={notice.ok ? "saved" : "clash"} />{notice.text}
            </p>
          )}
        </div>
      )}
      <p className="text-xs text-tin">Pitch and design temperature apply to every scheme of the project (pipe lengths follow them).</p>
    </form>
  );
}
