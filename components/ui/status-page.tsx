import type { ReactNode } from "react";
import { Wordmark } from "./logo";

/**
 * A rack of pipes with one missing or one fallen: the picture for a page that is not there or a
 * server that cannot answer, drawn in ink on paper like the chest drawings.
 */
export function StatusPicture({ kind }: { kind: "missing" | "fallen" }) {
  const heights = [44, 38, 33, 29, 26, 23];
  return (
    <svg viewBox="0 0 132 64" className="h-16 w-32" aria-hidden="true">
      <path d="M6 58h120" stroke="#b0852f" strokeWidth="3" strokeLinecap="round" />
      {heights.map((h, i) => {
        const x = 16 + i * 20;
        if (kind === "missing" && i === 3) {
          return <rect key={i} x={x - 5} y={58 - h} width="10" height={h} fill="none" stroke="#8a929c" strokeWidth="1.5" strokeDasharray="3 3" />;
        }
        if (kind === "fallen" && i === 2) {
          return <rect key={i} x={x - 8} y={50} width={h} height="8" rx="1" fill="none" stroke="#c2412d" strokeWidth="2" transform={`rotate(-8 ${x} 54)`} />;
        }
        return <rect key={i} x={x - 5} y={58 - h} width="10" height={h} rx="1" fill="#fffdf8" stroke="#1d2433" strokeWidth="2" />;
      })}
    </svg>
  );
}

type StatusPageProps = { picture: ReactNode; title: string; children: ReactNode; actions: ReactNode; testId: string; inApp?: boolean };

/**
 * The frame of the not-found and error pages: picture, heading, words, actions. On its own it fills
 * the screen under the wordmark; `inApp`, it sits under the signed-in header, which already has one.
 */
export function StatusPage({ picture, title, children, actions, testId, inApp = false }: StatusPageProps) {
  const panel = (
    <div className="panel p-6 sm:p-8">
      <div className="mb-4">{picture}</div>
      <h1 className="mb-2 text-2xl font-semibold">{title}</h1>
      <div className="space-y-2 text-sm text-ink-soft">{children}</div>
      <div className="mt-5 flex flex-wrap gap-2">{actions}</div>
    </div>
  );
  if (inApp) {
    return <div className="mx-auto w-full max-w-lg py-6 sm:py-12" data-testid={testId}>{panel}</div>;
  }
  return (
    <main className="grid min-h-screen place-items-center px-4 py-10" data-testid={testId}>
      <div className="w-full max-w-lg">
        <div className="mb-6 flex justify-center"><Wordmark /></div>
        {panel}
      </div>
    </main>
  );
}
