"use client";
import dynamic from "next/dynamic";
import Link from "next/link";
import { useCallback, useEffect, useMemo, useReducer, useState } from "react";
import { Dialog } from "@/components/ui/dialog";
import { StateMark } from "@/components/ui/state-mark";
import type { SchemeDocument, SchemeRead } from "@/lib/spec/document";
import { DivisionBoard } from "./division-board";
import { useColumnFigures } from "./board-figures";
import { addDivision, addStop, findStop, moveStop, newId, removeDivision, removeStop, setAccessories, setWorks, updateDivision, updateStop } from "./doc-ops";
import { FiguresPanel } from "./figures-panel";
import { formatDateTime, formatNumber, formatTimeOfDay, stopTitle } from "./format";
import { historyReducer, initHistory, nextRedo, nextUndo } from "./history";
import { SaveStateBadge } from "./save-state";
import { drawingRulesOf, useFigures, type FigureSource } from "./use-figures";
import { clearDraft, readDraft, sameDocument, type UnsavedDraft } from "./unsaved-drafts";
import { useLeaveGuard } from "./use-leave-guard";
import { useSchemeSave, type SaveState } from "./use-scheme-save";

// What the editor shows only on demand (other tabs, dialogs, revisions) is loaded when first opened:
// the charts, forms and file list are not parsed and run while a large scheme loads.
const ScalesView = dynamic(() => import("@/components/drawing/scales-view").then((m) => m.ScalesView));
const ChestsView = dynamic(() => import("./chests-view").then((m) => m.ChestsView));
const AccessoriesEditor = dynamic(() => import("./accessories-editor").then((m) => m.AccessoriesEditor));
const WorksEditor = dynamic(() => import("./works-editor").then((m) => m.WorksEditor));
const RevisionsPanel = dynamic(() => import("./revisions-panel").then((m) => m.RevisionsPanel));
const StopForm = dynamic(() => import("./stop-form").then((m) => m.StopForm));
const DivisionForm = dynamic(() => import("./division-form").then((m) => m.DivisionForm));
// The scheme's details form brings zod and react-hook-form: loaded when opened, not with the board.
const DetailsForm = dynamic(() => import("./scheme-details-form").then((m) => m.DetailsForm));
const StopDetails = dynamic(() => import("./stop-details").then((m) => m.StopDetails));
const StopFiles = dynamic(() => import("@/components/files/stop-files").then((m) => m.StopFiles));

type Editing =
  | { kind: "stop"; divisionId: string; stopId?: string; newId: string }
  /** A reader who does not edit opens a stop to read its details. */
  | { kind: "view"; stopId: string }
  | { kind: "division"; divisionId?: string; newId: string }
  | { kind: "details" }
  | null;

type Tab = "stops" | "scales" | "chests" | "accessories" | "works";


export function SchemeEditor({
  initialScheme,
  projectId,
  projectName,
  editable,
  showMoney,
  showFigures,
  canSeeRevisions,
  figureSource,
}: {
  initialScheme: SchemeRead;
  projectId: string;
  projectName: string;
  editable: boolean;
  showMoney: boolean;
  /** Committee members see the board and the stop list, not the working figures. */
  showFigures: boolean;
  canSeeRevisions: boolean;
  /** The firm's rates for those who may hold them, else figures made on the server (lib/server/figures.ts). */
  figureSource: FigureSource;
}) {
  const [history, dispatch] = useReducer(historyReducer, initialScheme.document, initHistory);
  const doc = history.present;
  const save = useSchemeSave({ scheme: initialScheme, present: doc, label: history.label, enabled: editable });
  const { saveNow } = save;
  const { figures, stale, ahead, guess } = useFigures(doc, initialScheme.tuning, figureSource);
  const drawingUnits = drawingRulesOf(figureSource).drawingUnits;
  const columnFigures = useColumnFigures(figures, drawingUnits);
  const [figuresOpen, setFiguresOpen] = useState(false);
  const [tab, setTab] = useState<Tab>("stops");
  const [editing, setEditing] = useState<Editing>(null);
  const [showRevisions, setShowRevisions] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [draft, setDraft] = useState<UnsavedDraft | null>(null);
  const leave = useLeaveGuard({ enabled: editable, hasUnsaved: () => save.state.kind !== "saved", flush: save.flush });

  // Work left unsaved in this browser last time (a crash, a closed tab, no connection) is offered back.
  useEffect(() => {
    if (!editable) return;
    const kept = readDraft(initialScheme.id);
    if (!kept) return;
    if (sameDocument(kept.document, initialScheme.document)) {
      clearDraft(initialScheme.id);
      return;
    }
    // After the first paint: the server's page has no browser storage to agree with.
    const t = setTimeout(() => setDraft(kept), 0);
    return () => clearTimeout(t);
  }, [editable, initialScheme.id, initialScheme.document]);

  function restoreDraft(kept: UnsavedDraft) {
    setDraft(null);
    // Saved against the version it was made on: if the scheme moved on, the conflict choice follows.
    save.rebase(kept.baseVersion);
    dispatch({ type: "replace", doc: kept.document, label: `Restored the changes from ${formatTimeOfDay(kept.savedAt)} that were not saved` });
    setNotice(`Restored the changes from ${formatTimeOfDay(kept.savedAt)} that were not saved.`);
  }
  function discardDraft() {
    clearDraft(initialScheme.id);
    setDraft(null);
  }

  const edit = useCallback(
    (next: SchemeDocument, label: string) => {
      // The worker starts on the new figures while React draws the edit.
      ahead(next);
      dispatch({ type: "edit", doc: next, label });
      setNotice(label);
    },
    [ahead],
  );
  // Undo and redo say what they took back or put again (the history's label); other notices clear.
  const undo = useCallback(() => {
    dispatch({ type: "undo" });
    setNotice(null);
  }, []);
  // Stable, so the memoised columns and cards do not re-render when the editor does; the stop's
  // division is looked up when the form opens.
  const openStop = useCallback(
    (stopId: string) => setEditing(editable ? { kind: "stop", divisionId: "", stopId, newId: "" } : { kind: "view", stopId }),
    [editable],
  );
  const editDivision = useCallback((divisionId: string) => setEditing({ kind: "division", divisionId, newId: "" }), []);
  const addStopTo = useCallback((divisionId: string) => setEditing({ kind: "stop", divisionId, newId: newId("stop") }), []);
  const redo = useCallback(() => {
    dispatch({ type: "redo" });
    setNotice(null);
  }, []);


  // Ctrl+Z / Ctrl+Shift+Z (and Ctrl+Y) undo and redo; inside a text field the field's own undo wins.
  useEffect(() => {
    if (!editable) return;
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey)) return;
      const t = e.target as HTMLElement | null;
      const inField = !!t && (t.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(t.tagName));
      const k = e.key.toLowerCase();
      if (k === "s") {
        e.preventDefault();
        void saveNow();
        return;
      }
      if (inField || document.querySelector("dialog[open]")) return;
      if (k === "z" && !e.shiftKey) {
        e.preventDefault();
        undo();
      } else if ((k === "z" && e.shiftKey) || k === "y") {
        e.preventDefault();
        redo();
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [editable, undo, redo, saveNow]);

  const state = save.state;

  function loadTheirs(current: SchemeRead) {
    dispatch({ type: "replace", doc: current.document, label: `Loaded version ${current.version}` });
    save.acceptServer(current, current.document);
    setNotice(`Loaded version ${current.version}. Undo brings your version back.`);
  }

  // Only the stop dialogs list the other stops: not worked out again for every move on the board.
  const dialogOpen = editing?.kind === "stop" || editing?.kind === "view";
  const sources = useMemo(() => {
    const out: { id: string; label: string }[] = [];
    if (!dialogOpen) return out;
    for (const d of doc.divisions) for (const s of d.stops) out.push({ id: s.id, label: `${d.name}: ${stopTitle(s)}` });
    return out;
  }, [doc, dialogOpen]);

  const editingStop = editing?.kind === "stop" && editing.stopId ? findStop(doc, editing.stopId) : null;
  const viewingStop = editing?.kind === "view" ? findStop(doc, editing.stopId) : null;
  const editingDivision = editing?.kind === "division" && editing.divisionId ? doc.divisions.find((d) => d.id === editing.divisionId) : undefined;
  const targetDivision = editing?.kind === "stop" ? (editingStop?.division ?? doc.divisions.find((d) => d.id === editing.divisionId)) : undefined;

  return (
    <div className="space-y-3">
      {/* Title and toolbar. Its links are not prefetched: on opening a large scheme, four server
          renders of other pages would compete with this page's own hydration and first figures. */}
      <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
        <div className="min-w-0 flex-1">
          <nav aria-label="Breadcrumb" className="text-xs text-tin">
            <Link href="/projects" prefetch={false} className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>{" "}
            <Link href={`/projects/${projectId}`} prefetch={false} className="hover:text-ink">{projectName}</Link> <span aria-hidden="true">/</span>
          </nav>
          <div className="flex items-baseline gap-3">
            <h1 className="truncate text-2xl font-semibold" data-testid="scheme-name">{doc.name}</h1>
            {editable && (
              <button type="button" className="text-xs text-tin underline hover:text-ink" onClick={() => setEditing({ kind: "details" })}>
                Rename / describe
              </button>
            )}
          </div>
          {doc.description && <p className="max-w-3xl text-sm text-ink-soft">{doc.description}</p>}
        </div>
        <div className="flex flex-wrap items-center gap-2">
          {editable ? <SaveStateBadge state={state} version={save.version} /> : <span className="text-sm text-tin" data-testid="save-state" data-state="read-only">Read only · v{save.version}</span>}
          {editable && (
            <>
              <button type="button" className="btn" onClick={undo} disabled={history.past.length === 0} aria-keyshortcuts="Control+Z" title={history.past.length ? `Undo: ${nextUndo(history)} (Ctrl+Z)` : "Nothing to undo"}>
                ↶ Undo
              </button>
              <button type="button" className="btn" onClick={redo} disabled={history.future.length === 0} aria-keyshortcuts="Control+Shift+Z" title={history.future.length ? `Redo: ${nextRedo(history)} (Ctrl+Shift+Z)` : "Nothing to redo"}>
                ↷ Redo
              </button>
              <button type="button" className="btn" onClick={() => void save.saveNow()} disabled={state.kind === "saved" || state.kind === "saving" || state.kind === "conflict"} title="Save now (Ctrl+S)">
                Save now
              </button>
            </>
          )}
          {canSeeRevisions && (
            <button type="button" className="btn" aria-pressed={showRevisions} onClick={() => setShowRevisions((v) => !v)}>
              Revisions
            </button>
          )}
          <Link className="btn" prefetch={false} href={`/projects/${projectId}/schemes/${initialScheme.id}/stop-list`}>Stop list</Link>
          {showFigures && <Link className="btn" prefetch={false} href={`/projects/${projectId}/schemes/${initialScheme.id}/pipes`}>Pipe tables</Link>}
        </div>
      </div>

      {/* The line is always there, so the board does not move down when the first notice appears. */}
      {editable && (
        <p className="min-h-4 truncate text-xs leading-4 text-tin" aria-live="polite" data-testid="last-edit">
          {state.kind !== "conflict" ? (notice ?? history.label ?? "") : ""}
        </p>
      )}

      {draft && (
        <div role="alert" className="flex flex-wrap items-center gap-3 rounded-md border border-caution bg-caution-light px-3 py-2 text-sm" data-testid="draft-banner">
          <StateMark kind="caution" className="h-4 w-4 text-caution" />
          <span className="flex-1">
            <strong>You have changes from {formatTimeOfDay(draft.savedAt)} that were not saved — restore them?</strong>
            {draft.baseVersion !== save.version && (
              <> They were made on version {draft.baseVersion}; the scheme is now at version {save.version}, so you will be asked which to keep.</>
            )}
          </span>
          <button type="button" className="btn-primary" onClick={() => restoreDraft(draft)}>Restore them</button>
          <button type="button" className="btn" onClick={discardDraft}>Discard them</button>
        </div>
      )}

      {state.kind === "conflict" && (
        <div role="alert" className="flex flex-wrap items-center gap-3 rounded-md border border-caution bg-caution-light px-3 py-2 text-sm" data-testid="conflict-banner">
          <StateMark kind="caution" className="h-4 w-4 text-caution" />
          <span className="flex-1">
            <strong>Someone else saved version {state.current.version}</strong>
            {state.current.updatedByName && <> ({state.current.updatedByName}, {formatDateTime(state.current.updatedAt)})</>} while you were editing. Nothing of yours is lost yet: choose which to keep.
          </span>
          <button type="button" className="btn" onClick={() => loadTheirs(state.current)}>
            Load their version
          </button>
          <button type="button" className="btn-primary" onClick={() => save.saveOver(state.current)}>
            Keep mine and save over
          </button>
          <span className="basis-full text-xs text-ink-soft">Loading theirs keeps yours one Undo away; saving over keeps theirs in the revisions.</span>
        </div>
      )}
      {state.kind === "invalid" && (
        <div role="alert" className="rounded-md border border-clash bg-clash-light px-3 py-2 text-sm text-clash" data-testid="invalid-banner">
          <p className="flex items-center gap-1.5 font-semibold"><StateMark kind="clash" />The server did not save this version:</p>
          <ul className="mt-1 list-disc pl-6 text-ink">
            {state.messages.map((m, i) => <li key={i}>{m}</li>)}
          </ul>
          <p className="mt-1 text-xs text-ink-soft">Your edits are kept here; correct them and the scheme saves again.</p>
        </div>
      )}
      {state.kind === "error" && (
        <div role="alert" className="flex items-center gap-3 rounded-md border border-clash bg-clash-light px-3 py-2 text-sm" data-testid="error-banner">
          <StateMark kind="clash" className="text-clash" />
          <span className="flex-1">{state.message}</span>
          <button type="button" className="btn" onClick={() => void save.saveNow()}>Try again</button>
        </div>
      )}

      <div className="grid items-start gap-4 lg:grid-cols-[minmax(0,1fr)_21rem]">
        <div className="min-w-0 space-y-3">
          <div role="tablist" aria-label="Views of the scheme" className="flex items-center gap-1 overflow-x-auto border-b border-tin-rule">
            {(
              [
                ["stops", "Divisions and stops"],
                ["scales", "Scales"],
                ["chests", "Chests"],
                ["accessories", "Couplers and accessories"],
                ["works", "Case, wind and site"],
              ] as const
            ).map(([key, label]) => (
              <button
                key={key}
                type="button"
                role="tab"
                id={`tab-${key}`}
                aria-selected={tab === key}
                aria-controls={`panel-${key}`}
                className={`-mb-px shrink-0 whitespace-nowrap rounded-t border px-3 py-1.5 text-sm ${tab === key ? "border-tin-rule border-b-paper bg-paper font-semibold text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
                onClick={() => setTab(key)}
              >
                {label}
              </button>
            ))}
            {editable && tab === "stops" && (
              <button type="button" className="btn ml-auto mb-1 shrink-0 whitespace-nowrap" onClick={() => setEditing({ kind: "division", newId: newId("div") })}>
                + Add division
              </button>
            )}
          </div>

          <div role="tabpanel" id={`panel-${tab}`} aria-labelledby={`tab-${tab}`}>
            {tab === "stops" &&
              (doc.divisions.length === 0 ? (
                <div className="panel p-6 text-center text-sm text-ink-soft">
                  No divisions yet.{" "}
                  {editable && (
                    <button type="button" className="btn-primary ml-2" onClick={() => setEditing({ kind: "division", newId: newId("div") })}>
                      Add the first division
                    </button>
                  )}
                </div>
              ) : (
                <DivisionBoard
                  doc={doc}
                  columnFigures={columnFigures}
                  editable={editable}
                  onChange={edit}
                  onGuess={guess}
                  onEditDivision={editDivision}
                  onAddStop={addStopTo}
                  onOpenStop={openStop}
                />
              ))}
            {tab === "scales" && (
              <ScalesView doc={doc} tuning={initialScheme.tuning} figures={figures} rules={drawingRulesOf(figureSource)} units={drawingRulesOf(figureSource).drawingUnits} editable={editable} projectId={projectId} schemeId={initialScheme.id} onChange={edit} />
            )}
            {tab === "chests" && <ChestsView doc={doc} tuning={initialScheme.tuning} figures={figures} rates={drawingRulesOf(figureSource)} />}
            {tab === "accessories" && (
              <AccessoriesEditor key={save.version + ":" + history.past.length} doc={doc} editable={editable} onApply={(acc) => edit(setAccessories(doc, acc), "Changed couplers and accessories")} />
            )}
            {tab === "works" && (
              <WorksEditor key={save.version + ":" + history.past.length} doc={doc} editable={editable} onApply={(w) => edit(setWorks(doc, w), "Changed the case, wind and site")} />
            )}
          </div>
        </div>

        <div className="space-y-3 lg:sticky lg:top-3">
          {showRevisions && (
            <RevisionsPanel
              schemeId={initialScheme.id}
              currentVersion={save.version}
              editable={editable}
              hasUnsaved={state.kind !== "saved"}
              onClose={() => setShowRevisions(false)}
              onRestored={(scheme, from) => {
                dispatch({ type: "replace", doc: scheme.document, label: `Restored version ${from}` });
                save.acceptServer(scheme, scheme.document);
                setNotice(`Restored version ${from} as version ${scheme.version}. Undo brings back what you had.`);
              }}
              onConflict={(current) => {
                if (current) save.reportConflict(current);
                else setNotice("Someone else saved meanwhile; reload the page to see their version.");
              }}
            />
          )}
          {showFigures && (
            <div className="hidden lg:block">
              <FiguresPanel figures={figures} showMoney={showMoney} units={drawingUnits} stale={stale} />
            </div>
          )}
        </div>
      </div>

      {/* Below the wide layout the figures are one tap away, from a bar that stays at the bottom. */}
      {showFigures && (
        <>
          <div className="sticky bottom-0 z-30 -mx-5 border-t border-tin-rule bg-paper-card/95 px-5 py-2 shadow-[0_-2px_6px_rgba(29,36,51,0.08)] lg:hidden print:hidden">
            <button type="button" className="flex w-full items-center gap-3 text-left text-sm" onClick={() => setFiguresOpen(true)} data-testid="figures-bar" aria-haspopup="dialog">
              <span className="font-semibold">Figures</span>
              <FiguresSummary figures={figures} stale={stale} />
              <span className="ml-auto btn py-1 text-xs">Show</span>
            </button>
          </div>
          <Dialog open={figuresOpen} onClose={() => setFiguresOpen(false)} title="Figures" wide>
            {figuresOpen && <FiguresPanel figures={figures} showMoney={showMoney} units={drawingUnits} stale={stale} />}
          </Dialog>
        </>
      )}

      <Dialog
        open={editing?.kind === "stop"}
        onClose={() => setEditing(null)}
        title={editingStop ? `${stopTitle(editingStop.stop)} — ${editingStop.division.name}` : `New stop — ${targetDivision?.name ?? ""}`}
        wide
      >
        {editingStop && editable && doc.divisions.length > 1 && (
          <div className="mb-3 flex flex-wrap items-center gap-2 border-b border-tin-rule pb-3 text-sm">
            <label htmlFor="stop-division" className="text-ink-soft">Division</label>
            <select
              id="stop-division"
              className="field w-auto py-1"
              value={editingStop.division.id}
              onChange={(e) => {
                const to = doc.divisions.find((d) => d.id === e.target.value);
                if (!to) return;
                edit(moveStop(doc, editingStop.stop.id, to.id, to.stops.length), `Moved ${stopTitle(editingStop.stop)} from the ${editingStop.division.name} to the ${to.name}`);
              }}
            >
              {doc.divisions.map((d) => <option key={d.id} value={d.id}>{d.name}</option>)}
            </select>
            <span className="text-xs text-tin">Moves it to the end of that division at once (Undo puts it back).</span>
          </div>
        )}
        {editing?.kind === "stop" && (
          <StopForm
            initial={editingStop?.stop}
            newId={editing.newId}
            sources={sources.filter((s) => s.id !== editing.stopId)}
            onCancel={() => setEditing(null)}
            onSubmit={(stop) => {
              // The form has no fields for survey measurements (the Scales tab keeps them): they stay with the stop.
              if (editingStop) edit(updateStop(doc, { ...(editingStop.stop.survey ? { survey: editingStop.stop.survey } : {}), ...stop }), `Changed ${stopTitle(stop)}`);
              else edit(addStop(doc, editing.divisionId, stop), `Added ${stopTitle(stop)} to the ${targetDivision?.name}`);
              setEditing(null);
            }}
            onDelete={
              editingStop
                ? () => {
                    edit(removeStop(doc, editingStop.stop.id), `Deleted ${stopTitle(editingStop.stop)} from the ${editingStop.division.name}`);
                    setEditing(null);
                  }
                : undefined
            }
          />
        )}
        {editingStop && <StopFiles projectId={projectId} schemeId={initialScheme.id} stopId={editingStop.stop.id} stopName={editingStop.stop.name} mayAdd={editable} />}
      </Dialog>

      <Dialog
        open={editing?.kind === "view"}
        onClose={() => setEditing(null)}
        title={viewingStop ? `${stopTitle(viewingStop.stop)} — ${viewingStop.division.name}` : "Stop"}
        wide
      >
        {viewingStop && (
          <>
            <StopDetails
              stop={viewingStop.stop}
              division={viewingStop.division}
              sourceName={viewingStop.stop.source ? (sources.find((x) => x.id === viewingStop.stop.source)?.label ?? null) : null}
              figures={figures}
            />
            <StopFiles projectId={projectId} schemeId={initialScheme.id} stopId={viewingStop.stop.id} stopName={viewingStop.stop.name} mayAdd={false} />
          </>
        )}
      </Dialog>

      <Dialog open={editing?.kind === "division"} onClose={() => setEditing(null)} title={editingDivision ? `Division: ${editingDivision.name}` : "New division"} wide>
        {editing?.kind === "division" && (
          <DivisionForm
            doc={doc}
            initial={editingDivision}
            newId={editing.newId}
            onCancel={() => setEditing(null)}
            onSubmit={(division) => {
              if (editingDivision) edit(updateDivision(doc, division), `Changed the ${division.name}`);
              else edit(addDivision(doc, division), `Added the ${division.name}`);
              setEditing(null);
            }}
            onDelete={
              editingDivision
                ? () => {
                    edit(removeDivision(doc, editingDivision.id), `Deleted the ${editingDivision.name} and its ${editingDivision.stops.length} stops`);
                    setEditing(null);
                  }
                : undefined
            }
          />
        )}
      </Dialog>

      <Dialog open={leave.blockedHref !== null} onClose={leave.stay} title="Your latest changes are not saved">
        <div className="space-y-3 text-sm" data-testid="leave-dialog">
          <p>{unsavedReason(state)}</p>
          <p className="text-ink-soft">If you leave now, they stay in this browser and the editor offers them back when you return.</p>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-primary" onClick={leave.stay}>Stay on this scheme</button>
            <button type="button" className="btn" onClick={leave.leave}>Leave; keep my changes in this browser</button>
          </div>
        </div>
      </Dialog>

      <Dialog open={editing?.kind === "details"} onClose={() => setEditing(null)} title="Scheme details">
        {editing?.kind === "details" && (
          <DetailsForm
            doc={doc}
            onCancel={() => setEditing(null)}
            onSubmit={(v) => {
              edit({ ...doc, name: v.name, description: v.description }, "Changed the scheme's name or description");
              setEditing(null);
            }}
          />
        )}
      </Dialog>
    </div>
  );
}

function unsavedReason(state: SaveState): string {
  switch (state.kind) {
    case "conflict":
      return `Someone else saved version ${state.current.version} while you were editing, so yours was not saved over it. Stay to choose which to keep.`;
    case "invalid":
      return `The server did not accept this version: ${state.messages.join(" ")}`;
    case "error":
      return state.message;
    default:
      return "Your changes could not be saved yet.";
  }
}

/** The bar's one line: pipes and whether every chest fits, so the reason to open the figures shows. */
function FiguresSummary({ figures, stale }: { figures: ReturnType<typeof useFigures>["figures"]; stale: boolean }) {
  if (!figures) return <span className="text-tin">working them out…</span>;
  if (!figures.ok) return <span className="inline-flex items-center gap-1 text-caution"><StateMark kind="caution" />waiting for the scheme to be complete</span>;
  const t = figures.estimate.totals;
  const clashes = figures.estimate.divisions.filter((d) => d.chest.fit && !d.chest.fit.fits).length;
  return (
    <span className={`num min-w-0 truncate ${stale ? "text-tin" : "text-ink-soft"}`}>
      {t.stops} stops · {formatNumber(t.pipes.total)} pipes
      {clashes > 0 && <span className="font-semibold text-clash"> · {clashes} {clashes === 1 ? "chest does" : "chests do"} not fit</span>}
    </span>
  );
}
