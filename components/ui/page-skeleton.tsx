/**
 * A page's outline while it loads on navigation (a route's `loading.tsx`): ruled blocks on paper
 * where the title, panels and table rows will be, so the page does not jump when they arrive.
 * Still under reduced motion; the words are for screen readers and for anyone who waits long.
 */
type Block = "table" | "panel" | "form" | "gallery";

function Bar({ className = "" }: { className?: string }) {
  return <span aria-hidden="true" className={`block rounded-sm bg-tin-rule/70 motion-safe:animate-pulse ${className}`} />;
}

function Table({ rows }: { rows: number }) {
  return (
    <div className="panel overflow-hidden">
      <div className="border-b border-tin-rule px-4 py-3"><Bar className="h-5 w-40" /></div>
      <ul className="divide-y divide-tin-rule">
        {Array.from({ length: rows }, (_, i) => (
          <li key={i} className="flex items-center gap-4 px-4 py-3">
            <Bar className="h-4 w-1/3 min-w-24" />
            <Bar className="hidden h-4 w-1/5 sm:block" />
            <Bar className="ml-auto h-4 w-16" />
          </li>
        ))}
      </ul>
    </div>
  );
}

function Panel({ lines }: { lines: number }) {
  return (
    <div className="panel space-y-3 p-4">
      <Bar className="h-5 w-48" />
      {Array.from({ length: lines }, (_, i) => <Bar key={i} className={`h-4 ${i % 3 === 2 ? "w-2/3" : "w-full"}`} />)}
    </div>
  );
}

function Form({ fields }: { fields: number }) {
  return (
    <div className="panel grid gap-4 p-4 sm:grid-cols-2">
      {Array.from({ length: fields }, (_, i) => (
        <div key={i} className="space-y-1.5"><Bar className="h-3 w-24" /><Bar className="h-9 w-full" /></div>
      ))}
    </div>
  );
}

function Gallery({ tiles }: { tiles: number }) {
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
      {Array.from({ length: tiles }, (_, i) => <Bar key={i} className="aspect-[4/3] w-full" />)}
    </div>
  );
}

export function PageSkeleton({ what, blocks, aside = false }: { what: string; blocks: readonly Block[]; aside?: boolean }) {
  const main = blocks.map((b, i) =>
    b === "table" ? <Table key={i} rows={5} /> : b === "panel" ? <Panel key={i} lines={4} /> : b === "form" ? <Form key={i} fields={6} /> : <Gallery key={i} tiles={10} />,
  );
  return (
    <div role="status" aria-live="polite" className="space-y-6" data-testid="page-loading">
      <span className="sr-only">Loading {what}…</span>
      <div className="space-y-2">
        <Bar className="h-3 w-20" />
        <Bar className="h-8 w-72 max-w-full" />
        <Bar className="h-4 w-56 max-w-full" />
      </div>
      {aside ? (
        <div className="grid grid-cols-1 gap-6 xl:grid-cols-[1fr_26rem]">
          <div className="min-w-0 space-y-6">{main}</div>
          <div className="space-y-6"><Panel lines={3} /><Panel lines={2} /></div>
        </div>
      ) : (
        main
      )}
    </div>
  );
}
