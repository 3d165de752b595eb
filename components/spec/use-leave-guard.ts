"use client";
/**
 * Leaving the editor by one of the app's own links saves first. The click is held (capture phase,
 * before the framework's link handler sees it), pending work is saved, and only then does the app
 * navigate. When the save cannot be made (refused, a conflict, no connection) the navigation stops
 * and the designer is asked; leaving anyway keeps the work in the browser to restore on return.
 */
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useRef, useState } from "react";

export function useLeaveGuard({ enabled, hasUnsaved, flush }: { enabled: boolean; hasUnsaved: () => boolean; flush: () => Promise<boolean> }) {
  const router = useRouter();
  const [blockedHref, setBlockedHref] = useState<string | null>(null);
  const [leaving, setLeaving] = useState(false);
  const hasUnsavedRef = useRef(hasUnsaved);
  const flushRef = useRef(flush);
  useEffect(() => {
    hasUnsavedRef.current = hasUnsaved;
    flushRef.current = flush;
  }, [hasUnsaved, flush]);

  useEffect(() => {
    if (!enabled) return;
    const onClick = (e: MouseEvent) => {
      if (e.defaultPrevented || e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
      const link = (e.target instanceof Element ? e.target.closest("a[href]") : null) as HTMLAnchorElement | null;
      if (!link || (link.target && link.target !== "_self") || link.hasAttribute("download")) return;
      const url = new URL(link.href, window.location.href);
      // Another site is a full page load, which the browser's own prompt covers; a hash stays here.
      if (url.origin !== window.location.origin) return;
      if (url.pathname === window.location.pathname && url.search === window.location.search) return;
      if (!hasUnsavedRef.current()) return;
      e.preventDefault();
      e.stopPropagation();
      const href = url.pathname + url.search + url.hash;
      setLeaving(true);
      void flushRef.current().then((saved) => {
        setLeaving(false);
        if (saved) router.push(href);
        else setBlockedHref(href);
      });
    };
    document.addEventListener("click", onClick, true);
    return () => document.removeEventListener("click", onClick, true);
  }, [enabled, router]);

  const stay = useCallback(() => setBlockedHref(null), []);
  const leave = useCallback(() => {
    const href = blockedHref;
    setBlockedHref(null);
    if (href) router.push(href);
  }, [blockedHref, router]);

  return { blockedHref, leaving, stay, leave };
}
