// The editor's speed with the large example scheme (about 150 stops) loaded:
// - the scheme API answers a read in under 50 ms (median of 30);
// - in Chromium, as a user meets it: the editor's load to interactive (navigation start to hydrated
//   and first figures painted; target <= 1 s), and 20 real mouse drags of a stop to the next
//   division: the longest task on the main thread while dragging (target <= 50 ms, the RAIL model's
//   long-task threshold) and the drop to painted figures less the estimator's own time in its worker
//   (median; target <= 16 ms, one frame at 60 Hz). The worker works out the figures of the place
//   under the pointer while the stop is carried, so the drop-to-figures time itself is printed too;
//   the estimator's time is that of the figures shown, whenever they were worked out;
// - the comparison route answers for the two parish schemes, and for the large scheme against a copy
//   with ten changes, in under 150 ms (median of 30), printed beside the scheme read of the same run;
//   the cost of each change (one estimate per change, asked for after the comparison) is printed too.
// Started by scripts/bench.sh against a production build with the demo data.
import { loadavg } from "node:os";
import { chromium, type Page } from "@playwright/test";
import { demoAccounts } from "../db/demo-accounts";

const base = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

async function signInCookies(email: string, password: string) {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = new Map<string, string>();
  const keep = (res: Response) => res.headers.getSetCookie().forEach((c) => { const [pair] = c.split(";"); const i = pair!.indexOf("="); jar.set(pair!.slice(0, i), pair!.slice(i + 1)); });
  keep(csrf);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST", redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: [...jar].map(([k, v]) => `${k}=${v}`).join("; ") },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(res);
  return jar;
}

type SchemeReadJson = { scheme: { document: { divisions: { stops: { id: string; origin: string; source?: string }[] }[] } } };

/** A stop of the first division that can move to any other division without making the scheme invalid. */
function freeStopOf(schemeId: string, read: SchemeReadJson): string {
  const divisions = read.scheme.document.divisions;
  const used = new Set(divisions.flatMap((d) => d.stops.map((s) => s.source).filter(Boolean)));
  const stop = divisions[0]?.stops.find((s) => !s.source && !used.has(s.id) && s.origin !== "removed");
  if (!stop) throw new Error(`scheme ${schemeId}: no stop in its first division that moves freely`);
  return stop.id;
}

type DragTiming = { longestTaskMs: number; dropToPaintMs: number; estimateMs: number };

/**
 * One real mouse drag: press on the stop's handle, 20 pointer moves to a point over the next
 * division's column, release. Long tasks are collected while the pointer moves; after the release,
 * the time to the frame that paints the figures for the new document (the panel no longer stale),
 * and the estimator's own time for it as the worker reported.
 */
async function timeMouseDrag(page: Page, stopId: string, target: string): Promise<DragTiming> {
  const handle = page.locator(`[data-stop-id="${stopId}"] button[aria-label^="Move "]`);
  await handle.scrollIntoViewIfNeeded();
  const from = (await handle.boundingBox())!;
  const to = (await page.locator(`[data-testid="division-${target}"]`).boundingBox())!;
  await page.evaluate(() => {
    const w = window as unknown as { __tasks: number[]; __obs?: PerformanceObserver; __drop?: number; __painted?: number; __ms?: number };
    w.__tasks = [];
    w.__drop = undefined;
    w.__painted = undefined;
    w.__obs = new PerformanceObserver((list) => { for (const e of list.getEntries()) w.__tasks.push(e.duration); });
    w.__obs.observe({ type: "longtask" });
  });
  const x0 = from.x + from.width / 2;
  const y0 = from.y + from.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  const x1 = to.x + to.width / 2;
  const y1 = to.y + Math.min(to.height / 2, 240);
  for (let i = 1; i <= 20; i++) await page.mouse.move(x0 + ((x1 - x0) * i) / 20, y0 + ((y1 - y0) * i) / 20);
  // Armed just before the release: the pointerup's capture listener runs before dnd-kit's.
  await page.evaluate(() => {
    const w = window as unknown as { __obs?: PerformanceObserver; __drop?: number; __painted?: number; __ms?: number };
    const figures = () => document.querySelector('[data-testid="figures"]')!;
    document.addEventListener("pointerup", () => {
      w.__drop = performance.now();
      w.__obs?.disconnect();
      const check = () => {
        const f = figures();
        if (f.getAttribute("data-state") === "ok" && !f.hasAttribute("data-stale") && w.__painted === undefined) {
          obs.disconnect();
          w.__ms = Number(f.getAttribute("data-estimate-ms"));
          requestAnimationFrame(() => { w.__painted = performance.now(); });
        }
      };
      const obs = new MutationObserver(check);
      obs.observe(figures(), { subtree: true, childList: true, characterData: true, attributes: true });
    }, { capture: true, once: true });
  });
  await page.mouse.up();
  await page.waitForFunction(() => (window as unknown as { __painted?: number }).__painted !== undefined, null, { timeout: 10_000 });
  return page.evaluate(() => {
    const w = window as unknown as { __tasks: number[]; __drop: number; __painted: number; __ms: number };
    return { longestTaskMs: Math.max(0, ...w.__tasks), dropToPaintMs: w.__painted - w.__drop, estimateMs: w.__ms };
  });
}

/**
 * Navigation start to the editor hydrated (the header's and the board's controls), every stop's card
 * on the board and the first figures painted, in the page's own clock.
 */
async function timeLoad(page: Page, url: string, stops: number): Promise<number> {
  await page.goto(url);
  return page.evaluate(
    (stops) =>
      new Promise<number>((resolve) => {
        const hydrated = (el: Element | undefined | null) => !!el && Object.keys(el).some((k) => k.startsWith("__reactProps"));
        const ready = () => {
          const f = document.querySelector('[data-testid="figures"]');
          const button = [...document.querySelectorAll("button")].find((b) => b.textContent?.trim() === "Sign out");
          const cards = document.querySelectorAll("[data-stop-id]");
          const lastGrip = cards[cards.length - 1]?.querySelector("button");
          if (hydrated(button) && cards.length === stops && hydrated(lastGrip) && f?.getAttribute("data-state") === "ok" && !f.hasAttribute("data-stale")) requestAnimationFrame(() => resolve(performance.now()));
          else setTimeout(ready, 5);
        };
        ready();
      }),
    stops,
  );
}

async function main() {
  const tonal = demoAccounts.find((a) => a.role === "designer")!;
  const jar = await signInCookies(tonal.email, tonal.password);
  const cookie = [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const { projects } = (await (await fetch(`${base}/api/projects`, { headers: { cookie } })).json()) as { projects: { id: string; name: string }[] };
  const project = projects.find((p) => p.name.startsWith("Vellmar"))!;
  const { schemes } = (await (await fetch(`${base}/api/projects/${project.id}`, { headers: { cookie } })).json()) as { schemes: { id: string; name: string; stopCount: number }[] };
  const scheme = schemes[0]!;

  const reads: number[] = [];
  for (let i = 0; i < 35; i++) {
    const t0 = performance.now();
    const res = await fetch(`${base}/api/schemes/${scheme.id}`, { headers: { cookie } });
    await res.arrayBuffer();
    if (i >= 5) reads.push(performance.now() - t0);
  }
  const readMs = median(reads);
  console.log(`scheme API read, ${scheme.stopCount} stops: median ${readMs.toFixed(1)} ms over ${reads.length} reads (target < 50 ms)`);

  const timeGet = async (url: string, n: number, warm = 5) => {
    const ms: number[] = [];
    for (let i = 0; i < n + warm; i++) {
      const t0 = performance.now();
      const res = await fetch(url, { headers: { cookie } });
      if (!res.ok) throw new Error(`${url} answered ${res.status}`);
      await res.arrayBuffer();
      if (i >= warm) ms.push(performance.now() - t0);
    }
    return median(ms);
  };
  const parish = projects.find((p) => p.name.startsWith("St Aldric"))!;
  const parishSchemes = ((await (await fetch(`${base}/api/projects/${parish.id}`, { headers: { cookie } })).json()) as { schemes: { id: string }[] }).schemes;
  const parishUrl = `${base}/api/projects/${parish.id}/compare?schemes=${parishSchemes.map((s) => s.id).join(",")}`;

  // A copy of the large scheme with ten changes: five stops restored instead of new, five removed.
  const post = (url: string, method: string, body: unknown) => fetch(url, { method, headers: { cookie, "content-type": "application/json", origin: base }, body: JSON.stringify(body) });
  const copy = ((await (await post(`${base}/api/schemes/${scheme.id}/duplicate`, "POST", { name: `Bench copy ${Date.now()}` })).json()) as { scheme: { id: string; version: number; document: { divisions: { stops: { id: string; origin: string; work?: string[]; source?: string }[] }[] } } }).scheme;
  const used = new Set(copy.document.divisions.flatMap((d) => d.stops.map((s) => s.source).filter(Boolean)));
  const plain = copy.document.divisions.flatMap((d) => d.stops).filter((s) => s.origin === "new" && !used.has(s.id) && !s.source);
  for (const s of plain.slice(0, 5)) Object.assign(s, { origin: "existing", work: ["restored"] });
  const gone = new Set(plain.slice(5, 10).map((s) => s.id));
  for (const d of copy.document.divisions) d.stops = d.stops.filter((s) => !gone.has(s.id));
  const saved = await post(`${base}/api/schemes/${copy.id}`, "PUT", { version: copy.version, document: copy.document, note: "ten changes for the benchmark" });
  if (!saved.ok) throw new Error(`saving the copy answered ${saved.status}: ${await saved.text()}`);
  const largeIds = `${scheme.id},${copy.id}`;
  const largeUrl = `${base}/api/projects/${project.id}/compare?schemes=${largeIds}`;

  // Interleaved, so a busy moment of the machine falls on both alike.
  const parishTimes: number[] = [];
  const largeTimes: number[] = [];
  for (let i = 0; i < 35; i++) {
    for (const [url, into] of [[parishUrl, parishTimes], [largeUrl, largeTimes]] as const) {
      const t0 = performance.now();
      const res = await fetch(url, { headers: { cookie } });
      if (!res.ok) throw new Error(`${url} answered ${res.status}`);
      await res.arrayBuffer();
      if (i >= 5) into.push(performance.now() - t0);
    }
  }
  const parishMs = median(parishTimes);
  const largeMs = median(largeTimes);
  console.log(`comparison, the two parish schemes: median ${parishMs.toFixed(1)} ms over 30 (target < 150 ms; ${(parishMs / readMs).toFixed(1)}× the scheme read)`);
  console.log(`comparison, large scheme against a copy with ten changes: median ${largeMs.toFixed(1)} ms over 30 (target < 150 ms; ${(largeMs / readMs).toFixed(1)}× the scheme read)`);
  const costsMs = await timeGet(`${base}/api/projects/${project.id}/compare/costs?schemes=${largeIds}`, 5, 1);
  console.log(`cost of each of the ten changes, large scheme: median ${costsMs.toFixed(1)} ms over 5 (no target; loaded after the comparison)`);

  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
    // tsx keeps function names with a __name() helper, which the functions sent to the page call.
    await context.addInitScript("window.__name = (f) => f;");
    await context.addCookies([...jar].map(([name, value]) => ({ name, value, url: base })));
    const page = await context.newPage();
    const editorUrl = `${base}/projects/${project.id}/schemes/${scheme.id}`;
    const read = (await (await fetch(`${base}/api/schemes/${scheme.id}`, { headers: { cookie } })).json()) as SchemeReadJson;
    const cards = read.scheme.document.divisions.reduce((n, d) => n + d.stops.length, 0);
    await timeLoad(page, editorUrl, cards); // warm: the server's caches and the browser's compiled scripts
    const loads: number[] = [];
    for (let i = 0; i < 5; i++) loads.push(await timeLoad(page, editorUrl, cards));
    const loadMs = median(loads);
    console.log(`editor load to interactive, ${scheme.stopCount} stops: median ${loadMs.toFixed(0)} ms over ${loads.length} loads (${loads.map((ms) => ms.toFixed(0)).join(", ")}; target <= 1000 ms)`);

    // The first stop of the first division that no other stop borrows or extends and that borrows
    // nothing itself (so it may stand on any chest), dragged with the mouse to the next division and back.
    const stopId = freeStopOf(scheme.id, read);
    const label = (await page.locator(`[data-stop-id="${stopId}"] button[aria-label^="Move "]`).getAttribute("aria-label"))!;
    const names = await page.locator("section[data-division-id]").evaluateAll((els) => els.map((e) => e.getAttribute("data-testid")!.slice("division-".length)));
    const runs: DragTiming[] = [];
    for (let i = 0; i < 22; i++) {
      const t = await timeMouseDrag(page, stopId, names[i % 2 === 0 ? 1 : 0]!);
      if (i >= 2) runs.push(t);
    }
    const over = runs.map((r) => r.dropToPaintMs - r.estimateMs);
    const longest = Math.max(...runs.map((r) => r.longestTaskMs));
    const overMs = median(over);
    const workerMs = median(runs.map((r) => r.estimateMs));
    console.log(`mouse drag of ${label}, 20 moves each, ${runs.length} drags: longest task while dragging ${longest.toFixed(0)} ms (median of the drags' longest ${median(runs.map((r) => r.longestTaskMs)).toFixed(0)} ms; target <= 50 ms)`);
    console.log(`drop to figures painted: median ${median(runs.map((r) => r.dropToPaintMs)).toFixed(1)} ms; the estimator's own time for those figures in its worker (while the stop was carried, or after the drop) ${workerMs.toFixed(1)} ms; over the estimator: median ${overMs.toFixed(1)} ms (target <= 16 ms)`);
    const row = (what: string, value: string, target: string, met: boolean) => `  ${what.padEnd(40)}${value.padStart(12)}   ${target.padEnd(10)} ${met ? "met" : "MISSED"}`;
    console.log(`editor targets, ${scheme.stopCount} stops, in Chromium (load average ${loadavg().map((x) => x.toFixed(2)).join(" ")}):`);
    console.log(row("load to interactive (median)", `${loadMs.toFixed(0)} ms`, "<= 1000 ms", loadMs <= 1000));
    console.log(row("longest task while dragging", `${longest.toFixed(0)} ms`, "<= 50 ms", longest <= 50));
    console.log(row(`drop to figures over the worker's ${workerMs.toFixed(1)} ms`, `${overMs.toFixed(1)} ms`, "<= 16 ms", overMs <= 16));
    const missed = [longest > 50 && "long task while dragging", overMs > 16 && "drop to figures", loadMs > 1000 && "editor load"].filter(Boolean);
    if (missed.length) console.log(`editor targets missed: ${missed.join(", ")}`);
  } finally {
    await browser.close();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
