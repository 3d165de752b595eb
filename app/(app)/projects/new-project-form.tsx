"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { ApiError } from "@/components/spec/api";
import { useCreateProject } from "@/lib/query/hooks";
import { applyServerErrors } from "@/components/ui/server-errors";
import { projectInputSchema } from "@/lib/spec/projects";
import { ProjectFields, projectFieldNames, type ProjectFormValues } from "./project-fields";

const blank: ProjectFormValues = {
  name: "", clientName: "", venue: "", location: "", instrument: "", status: "enquiry", targetDate: null, pitchHz: 440, temperatureC: 18, notes: "",
};

export function NewProjectForm() {
  const router = useRouter();
  const create = useCreateProject();
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<ProjectFormValues, unknown, z.output<typeof projectInputSchema>>({
    resolver: zodResolver(projectInputSchema),
    defaultValues: blank,
  });

  const onSubmit = form.handleSubmit(async (values) => {
    setNotice(null);
    try {
      const { project } = await create.mutateAsync(values);
      router.push(`/projects/${project.id}`);
    } catch (err) {
      if (err instanceof ApiError) {
        const rest = applyServerErrors(form.setError, err.fields, projectFieldNames);
        setNotice([err.message, ...rest].join(" "));
      } else setNotice("The project could not be created.");
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="New project" className="space-y-3">
      <ProjectFields register={form.register} errors={form.formState.errors} idPrefix="new-project" compact />
      {notice && <p role="alert" className="text-sm text-clash"><span aria-hidden="true">✕ </span>{notice}</p>}
      <button type="submit" className="btn-primary" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Creating…" : "Create project"}
      </button>
    </form>
  );
}
