"use client";
import { useState } from "react";
import { StateMark } from "@/components/ui/state-mark";
import { errorText } from "@/components/spec/api";
import { formatDate } from "@/components/spec/format";
import { useSetProjectStatus } from "@/lib/query/hooks";
import { projectStatusLabels, projectStatuses, type ProjectRead, type ProjectStatus } from "@/lib/spec/projects";

/**
 * A project's details as text, for the roles that read them but do not edit them (a greyed form
 * looks editable and is not). The estimator, who manages where a project stands, sets its status here.
 */
export function ProjectDetailsText({ project, mayChangeStatus }: { project: ProjectRead; mayChangeStatus: boolean }) {
  const rows: [string, string][] = [
    ["Client", project.clientName],
    ["Venue", project.venue],
    ["Location", project.location],
    ["Instrument", project.instrument],
    ["Completion wanted by", project.targetDate ? formatDate(project.targetDate) : ""],
    ["Pitch", `a′ = ${project.pitchHz} Hz at ${project.temperatureC} °C`],
  ];
  return (
    <div className="space-y-3 text-sm" data-testid="project-details-text">
      <dl className="grid gap-x-4 gap-y-2 sm:grid-cols-[10rem_minmax(0,1fr)]">
        {mayChangeStatus ? null : (
          <>
            <dt className="label mb-0 sm:pt-0.5">Status</dt>
            <dd>{projectStatusLabels[project.status]}</dd>
          </>
        )}
        {rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="label mb-0 sm:pt-0.5">{label}</dt>
            <dd className="break-words">{value || <span className="text-tin">Not given</span>}</dd>
          </div>
        ))}
      </dl>
      {project.notes && (
        <div>
          <h3 className="label">Notes</h3>
          <p className="whitespace-pre-wrap break-words">{project.notes}</p>
        </div>
      )}
      {mayChangeStatus && <StatusControl project={project} />}
    </div>
  );
}

function StatusControl({ project }: { project: ProjectRead }) {
  const setStatus = useSetProjectStatus(project.id);
  const [choice, setChoice] = useState<ProjectStatus>(project.status);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <form
      aria-label="Project status"
      className="flex flex-wrap items-end gap-2 border-t border-tin-rule pt-3"
      onSubmit={(e) => {
        e.preventDefault();
        setNotice(null);
        setStatus.mutate(choice, {
          onSuccess: () => setNotice({ ok: true, text: `Status set to ${projectStatusLabels[choice]}.` }),
          onError: (err) => setNotice({ ok: false, text: errorText(err) }),
        });
      }}
    >
      <div>
        <label className="label" htmlFor="project-status-only">Status</label>
        <select id="project-status-only" className="field w-auto min-w-[11rem]" value={choice} onChange={(e) => { setChoice(e.target.value as ProjectStatus); setNotice(null); }}>
          {projectStatuses.map((s) => <option key={s} value={s}>{projectStatusLabels[s]}</option>)}
        </select>
      </div>
      <button type="submit" className="btn-primary" disabled={setStatus.isPending || choice === project.status}>
        {setStatus.isPending ? "Saving…" : "Set status"}
      </button>
      {notice && (
        <p role="status" className={`inline-flex items-center gap-1 ${notice.ok ? "text-fit" : "text-clash"}`}>
          <StateMark kind={notice.ok ? "saved" : "clash"} />{notice.text}
        </p>
      )}
    </form>
  );
}
