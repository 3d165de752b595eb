/**
 * What a scheme shows while the server reads it and draws a large board (about half a second for 150
 * stops): the editor's outline — title, tabs, columns of cards and the figures — in paper tones, so
 * the page answers at once and does not jump when the scheme arrives.
 */
import type { CSSProperties } from "react";

const COLUMNS = [7, 9, 8, 6, 5];

function Bar({ className, style }: { className: string; style?: CSSProperties }) {
  return <div className={`animate-pulse rounded bg-paper-deep ${className}`} style={style} />;
}

export default function SchemeLoading() {
  return (
    <div className="space-y-3" data-skeleton="scheme" aria-busy="true">
      <p className="sr-only" role="status">Opening the scheme…</p>
      <div aria-hidden="true" className="space-y-3">
        <div className="space-y-2">
          <Bar className="h-3 w-56" />
          <Bar className="h-7 w-72" />
          <Bar className="h-3 w-96 max-w-full" />
        </div>
        <div className="grid items-start gap-4 lg:grid-cols-[minmax(0,1fr)_21rem]">
          <div className="min-w-0 space-y-3">
            <div className="flex gap-2 border-b border-tin-rule pb-1.5">
              {[36, 16, 16, 40, 36].map((w, i) => <Bar key={i} className="h-6" style={{ width: `${w * 4}px` }} />)}
            </div>
            <div className="flex flex-col gap-3 overflow-hidden md:grid md:auto-cols-[minmax(15rem,20rem)] md:grid-flow-col md:items-start">
              {COLUMNS.map((cards, c) => (
                <div key={c} className={`${c === 0 ? "flex" : "hidden"} flex-col rounded-md border border-tin-rule bg-paper-deep/60 md:flex`}>
                  <div className="space-y-1.5 border-b border-tin-rule px-2.5 py-2">
                    <Bar className="h-5 w-24" />
                    <Bar className="h-3 w-36" />
                    <Bar className="h-3 w-28" />
                  </div>
                  <div className="flex flex-col gap-1.5 p-2">
                    {Array.from({ length: cards }, (_, i) => (
                      <div key={i} className="h-[3.375rem] rounded border border-tin-rule bg-paper-card px-2 py-1.5">
                        <Bar className="h-3.5 w-3/5" />
                        <Bar className="mt-2 h-2.5 w-2/5" />
                      </div>
                    ))}
                  </div>
                </div>
              ))}
            </div>
          </div>
          <div className="panel hidden space-y-2 p-3 lg:block">
            <Bar className="h-5 w-20" />
            {[80, 65, 90, 55, 70, 85].map((w, i) => <Bar key={i} className="h-3" style={{ width: `${w}%` }} />)}
          </div>
        </div>
      </div>
    </div>
  );
}
