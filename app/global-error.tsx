"use client";
import "./globals.css";

/** Only when the root layout itself fails: a bare page with its own document, in the same words. */
export default function GlobalError({ retry }: { error: unknown; retry: () => void }) {
  return (
    <html lang="en-GB">
      <body className="grid min-h-screen place-items-center bg-paper px-4 text-ink">
        <title>Stopwright: something went wrong</title>
        <main className="panel max-w-md p-6">
          <h1 className="mb-2 text-2xl font-semibold">Stopwright could not start this page</h1>
          <p className="text-sm">Try again in a moment. If it keeps happening, tell your administrator.</p>
          <button type="button" className="btn-primary mt-4" onClick={() => retry()}>Try again</button>
        </main>
      </body>
    </html>
  );
}
