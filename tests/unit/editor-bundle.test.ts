// The editor's first scripts: what the browser must load, compile and run before the board hydrates.
// zod, decimal.js, react-hook-form and the estimator belong in the figures worker (estimate.worker.ts)
// and in the forms and tabs that load when opened; one stray value import (a label from the
// estimator's barrel, an order from the scheme model) brings them all back onto the main thread.
// Bundled here with esbuild as the modules import each other, following static imports only.
import { build } from "esbuild";
import { describe, expect, it } from "vitest";

async function eagerModules(entry: string): Promise<Set<string>> {
  const { metafile } = await build({
    entryPoints: [entry],
    bundle: true,
    splitting: true,
    format: "esm",
    outdir: "/dev/null/editor-bundle",
    write: false,
    metafile: true,
    jsx: "automatic",
    logLevel: "silent",
    loader: { ".css": "empty" },
    external: ["react", "react-dom", "next", "@tanstack/*", "@dnd-kit/*"],
  });
  const seen = new Set<string>([entry]);
  const queue = [entry];
  while (queue.length) {
    for (const i of metafile.inputs[queue.pop()!]?.imports ?? []) {
      if (i.kind === "import-statement" && !seen.has(i.path)) {
        seen.add(i.path);
        queue.push(i.path);
      }
    }
  }
  return seen;
}

describe("the scheme editor's first scripts", () => {
  it("hold neither zod, decimal.js, react-hook-form nor the estimator", async () => {
    const eager = [...(await eagerModules("components/spec/scheme-editor.tsx"))];
    expect(eager).toContain("components/spec/division-board.tsx");
    expect(eager).toContain("components/spec/figures-panel.tsx");
    const heavy = eager.filter((p) => /node_modules\/(zod|decimal\.js|react-hook-form)\//.test(p) || p === "lib/estimate/index.ts" || p === "lib/estimate/estimate.ts" || p === "lib/estimate/scheme.ts");
    expect(heavy).toEqual([]);
  }, 30_000);
});
