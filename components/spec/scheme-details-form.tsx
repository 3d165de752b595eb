"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { schemeDocumentSchema, type SchemeDocument } from "@/lib/spec/document";

const detailsSchema = schemeDocumentSchema.pick({ name: true, description: true });

/** The scheme's name and description, in the editor's details dialog. */
export function DetailsForm({ doc, onSubmit, onCancel }: { doc: SchemeDocument; onSubmit: (v: z.output<typeof detailsSchema>) => void; onCancel: () => void }) {
  const form = useForm<z.input<typeof detailsSchema>, unknown, z.output<typeof detailsSchema>>({
    resolver: zodResolver(detailsSchema),
    defaultValues: { name: doc.name, description: doc.description },
  });
  const err = form.formState.errors;
  return (
    <form onSubmit={form.handleSubmit(onSubmit)} noValidate className="space-y-3" aria-label="Scheme details">
      <div>
        <label className="label" htmlFor="scheme-doc-name">Name of the scheme</label>
        <input id="scheme-doc-name" className="field" aria-invalid={!!err.name} {...form.register("name")} />
        {err.name && <p className="field-error">✕ {err.name.message}</p>}
      </div>
      <div>
        <label className="label" htmlFor="scheme-doc-description">Description</label>
        <textarea id="scheme-doc-description" rows={4} className="field" {...form.register("description")} />
        {err.description && <p className="field-error">✕ {err.description.message}</p>}
      </div>
      <div className="flex gap-2">
        <button type="submit" className="btn-primary">Apply</button>
        <button type="button" className="btn" onClick={onCancel}>Cancel</button>
      </div>
    </form>
  );
}
