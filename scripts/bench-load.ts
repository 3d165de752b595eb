// Speed under load: 32 connections on loopback with autocannon, each request measured against the
// floor of the same run, GET /api/health (one trivial query, no session). Targets (ratios):
//   GET /api/schemes/:id (the large 150-stop scheme)  ≥ 0.6 × the floor
//   GET /api/schemes/:id/estimate                     ≥ 0.5 × the floor
// with no errors and no answer outside 2xx. Started by scripts/bench.sh against a production build
// with the demo data; prints a table and exits 1 when a target is missed. The server's CPU time per
// request (from /proc, given BENCH_SERVER_PID) is printed too: it does not depend on what else the
// machine is doing, which requests/s on shared cores do.
import { readFileSync } from "node:fs";
import autocannon from "autocannon";
import { demoAccounts } from "../db/demo-accounts";

const base = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3200";
const CONNECTIONS = 32;
/** Seconds per measurement, and for the warm-up of each request before it. */
const SECONDS = Number(process.env.BENCH_LOAD_SECONDS ?? 6);
const ROUNDS = 3;
const WARM_SECONDS = 2;

async function signInCookie(email: string, password: string): Promise<string> {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = new Map<string, string>();
  const keep = (res: Response) =>
    res.headers.getSetCookie().forEach((c) => {
      const [pair] = c.split(";");
      const i = pair!.indexOf("=");
      jar.set(pair!.slice(0, i), pair!.slice(i + 1));
    });
  keep(csrf);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: [...jar].map(([k, v]) => `${k}=${v}`).join("; ") },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`sign-in failed for ${email}`);
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

type Measure = { rps: number; p99: number; errors: number; non2xx: number; cpuMsPerRequest: number | null };

/** CPU time the server process has used, in ms (Linux /proc; null elsewhere or without a pid). */
function serverCpuMs(): number | null {
  const pid = Number(process.env.BENCH_SERVER_PID);
  if (!pid) return null;
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]!.split(" ");
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100; // utime + stime, in 1/100 s ticks
  } catch {
    return null;
  }
}

async function load(path: string, cookie: string | undefined, seconds: number): Promise<Measure> {
  const cpu0 = serverCpuMs();
  const result = await autocannon({ url: `${base}${path}`, connections: CONNECTIONS, duration: seconds, headers: cookie ? { cookie } : {}, timeout: 10 });
  const cpu1 = serverCpuMs();
  const total = result.requests.total || 1;
  return {
    rps: result.requests.average,
    p99: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    cpuMsPerRequest: cpu0 === null || cpu1 === null ? null : (cpu1 - cpu0) / total,
  };
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

async function main() {
  const tonal = demoAccounts.find((a) => a.role === "designer")!;
  const cookie = await signInCookie(tonal.email, tonal.password);
  const { projects } = (await (await fetch(`${base}/api/projects`, { headers: { cookie } })).json()) as { projects: { id: string; name: string }[] };
  const project = projects.find((p) => p.name.startsWith("Vellmar"))!;
  const { schemes } = (await (await fetch(`${base}/api/projects/${project.id}`, { headers: { cookie } })).json()) as { schemes: { id: string; stopCount: number }[] };
  const scheme = schemes[0]!;
  const requests = [
    { label: "GET /api/health (the floor)", path: "/api/health", cookie: undefined as string | undefined, target: null as number | null },
    { label: `GET /api/schemes/:id (${scheme.stopCount} stops)`, path: `/api/schemes/${scheme.id}`, cookie, target: 0.6 },
    { label: "GET /api/schemes/:id/estimate", path: `/api/schemes/${scheme.id}/estimate`, cookie, target: 0.5 },
  ];

  for (const r of requests) await load(r.path, r.cookie, WARM_SECONDS);
  // Rounds of floor, read, estimate: each ratio is taken against the floor of its own round, and
  // the table gives medians, so a machine whose other work comes and goes does not tilt one request.
  const runs: Measure[][] = requests.map(() => []);
  for (let round = 0; round < ROUNDS; round++) {
    for (const [i, r] of requests.entries()) runs[i]!.push(await load(r.path, r.cookie, SECONDS));
  }
  const floorRps = runs[0]!.map((m) => m.rps);

  const lines = [
    `${CONNECTIONS} connections on loopback, ${ROUNDS} rounds of ${SECONDS} s per request; medians. Floor per round: ${floorRps.map((r) => r.toFixed(0)).join(", ")} requests/s`,
    "",
    "| request | requests/s | p99 | errors | non-2xx | server CPU per request | ratio to the floor | target | met |",
    "|---|---|---|---|---|---|---|---|---|",
  ];
  let failed = false;
  for (const [i, r] of requests.entries()) {
    const ms = runs[i]!;
    const ratio = median(ms.map((m, round) => m.rps / floorRps[round]!));
    const errors = ms.reduce((n, m) => n + m.errors, 0);
    const non2xx = ms.reduce((n, m) => n + m.non2xx, 0);
    const met = (r.target === null || ratio >= r.target) && errors === 0 && non2xx === 0;
    failed ||= !met;
    const cpu = ms.every((m) => m.cpuMsPerRequest !== null) ? `${median(ms.map((m) => m.cpuMsPerRequest!)).toFixed(2)} ms` : "n/a";
    lines.push(
      `| ${r.label} | ${median(ms.map((m) => m.rps)).toFixed(0)} | ${median(ms.map((m) => m.p99))} ms | ${errors} | ${non2xx} | ${cpu} | ${ratio.toFixed(2)} | ${r.target === null ? "" : `≥ ${r.target.toFixed(1)}`} | ${met ? "yes" : "NO"} |`,
    );
  }
  console.log(lines.join("\n"));
  if (failed) {
    console.error("\nload targets missed");
    process.exit(1);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
