"use client";
import Link from "next/link";
import { useEffect, useState } from "react";
import { StatusPage, StatusPicture } from "@/components/ui/status-page";

type Cause = "checking" | "database" | "other";

/** How often the page asks whether the database is back (ms); the server's own retry hint is 5 s. */
const RECHECK_MS = 5_000;

/**
 * A screen that failed on the server. The server sends no details (only a reference), so the page
 * asks the health check whether the database is answering: if not, it says so and tries again by
 * itself until it is back; otherwise it offers to try again and gives the reference.
 */
export default function ErrorPage({ error, retry }: { error: unknown; retry: () => void }) {
  const [cause, setCause] = useState<Cause>("checking");
  const digest = error instanceof Error && "digest" in error ? String((error as { digest?: unknown }).digest ?? "") : "";

  useEffect(() => {
    let stopped = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const check = async () => {
      let healthy = false;
      try {
        healthy = (await fetch("/api/health", { cache: "no-store" })).ok;
      } catch {
        healthy = false; // the server itself is out of reach: the same advice applies
      }
      if (stopped) return;
      if (healthy && cause === "database") return retry();
      setCause(healthy ? "other" : "database");
      if (!healthy) timer = setTimeout(check, RECHECK_MS);
    };
    void check();
    return () => {
      stopped = true;
      clearTimeout(timer);
    };
  }, [cause, retry]);

  if (cause === "database") {
    return (
      <StatusPage
        testId="error-database"
        picture={<StatusPicture kind="fallen" />}
        title="The database is not answering"
        actions={<button type="button" className="btn-primary" onClick={() => retry()}>Try again now</button>}
      >
        <p>Stopwright cannot reach its database just now, so this page cannot be shown. Nothing you saved before is lost.</p>
        <p role="status">This page tries again by itself every few seconds and opens as soon as the database is back.</p>
      </StatusPage>
    );
  }
  return (
    <StatusPage
      testId="error-other"
      picture={<StatusPicture kind="fallen" />}
      title={cause === "checking" ? "This page could not be shown" : "Something went wrong on our side"}
      actions={
        <>
          <button type="button" className="btn-primary" onClick={() => retry()}>Try again</button>
          <Link href="/" className="btn">Home</Link>
        </>
      }
    >
      <p>The server could not put this page together. Trying again often helps; if it keeps happening, tell your administrator.</p>
      {digest && <p className="text-xs text-tin">Reference for your administrator: <span className="font-mono">{digest}</span></p>}
    </StatusPage>
  );
}
