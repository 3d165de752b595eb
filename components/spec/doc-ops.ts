/** Edits of a scheme document as pure functions: each returns a new document, so undo is a stack of them. */
import type { DocDivision, DocStop, SchemeDocument } from "@/lib/spec/document";

export function newId(prefix: string): string {
  const rnd =
    typeof crypto !== "undefined" && "randomUUID" in crypto
      ? crypto.randomUUID().slice(0, 8)
      : Math.random().toString(36).slice(2, 10);
  return `${prefix}-${rnd}`;
}

export function findStop(doc: SchemeDocument, stopId: string): { division: DocDivision; stop: DocStop; index: number } | null {
  for (const division of doc.divisions) {
    const index = division.stops.findIndex((s) => s.id === stopId);
    if (index >= 0) return { division, stop: division.stops[index], index };
  }
  return null;
}

export function addDivision(doc: SchemeDocument, division: DocDivision): SchemeDocument {
  return { ...doc, divisions: [...doc.divisions, division] };
}

export function updateDivision(doc: SchemeDocument, division: DocDivision): SchemeDocument {
  return { ...doc, divisions: doc.divisions.map((d) => (d.id === division.id ? { ...division, stops: d.stops } : d)) };
}

/** Removing a division also removes its couplers and tremulant, which would point nowhere. */
export function removeDivision(doc: SchemeDocument, divisionId: string): SchemeDocument {
  const acc = doc.accessories;
  return {
    ...doc,
    divisions: doc.divisions.filter((d) => d.id !== divisionId),
    accessories: {
      ...acc,
      couplers: acc.couplers.filter((c) => c.from !== divisionId && c.to !== divisionId),
      tremulants: acc.tremulants.filter((t) => t.division !== divisionId),
    },
  };
}

export function moveDivision(doc: SchemeDocument, from: number, to: number): SchemeDocument {
  if (from === to || from < 0 || to < 0 || from >= doc.divisions.length || to >= doc.divisions.length) return doc;
  const divisions = [...doc.divisions];
  const [moved] = divisions.splice(from, 1);
  divisions.splice(to, 0, moved);
  return { ...doc, divisions };
}

export function addStop(doc: SchemeDocument, divisionId: string, stop: DocStop, index?: number): SchemeDocument {
  return {
    ...doc,
    divisions: doc.divisions.map((d) => {
      if (d.id !== divisionId) return d;
      const stops = [...d.stops];
      stops.splice(index ?? stops.length, 0, stop);
      return { ...d, stops };
    }),
  };
}

export function updateStop(doc: SchemeDocument, stop: DocStop): SchemeDocument {
  return {
    ...doc,
    divisions: doc.divisions.map((d) =>
      d.stops.some((s) => s.id === stop.id) ? { ...d, stops: d.stops.map((s) => (s.id === stop.id ? stop : s)) } : d,
    ),
  };
}

/** Extensions and borrowings that drew on a removed stop lose their source rather than point nowhere. */
export function removeStop(doc: SchemeDocument, stopId: string): SchemeDocument {
  return {
    ...doc,
    divisions: doc.divisions.map((d) => ({
      ...d,
      stops: d.stops.filter((s) => s.id !== stopId).map((s) => (s.source === stopId ? { ...s, source: undefined } : s)),
    })),
  };
}

/** Moves a stop to `toIndex` in another (or the same) division; the index counts the target's stops without the moved one. */
export function moveStop(doc: SchemeDocument, stopId: string, toDivisionId: string, toIndex: number): SchemeDocument {
  const found = findStop(doc, stopId);
  if (!found) return doc;
  if (found.division.id === toDivisionId && found.index === toIndex) return doc;
  const without = doc.divisions.map((d) => (d.id === found.division.id ? { ...d, stops: d.stops.filter((s) => s.id !== stopId) } : d));
  return {
    ...doc,
    divisions: without.map((d) => {
      if (d.id !== toDivisionId) return d;
      const stops = [...d.stops];
      stops.splice(Math.max(0, Math.min(toIndex, stops.length)), 0, found.stop);
      return { ...d, stops };
    }),
  };
}

export function setAccessories(doc: SchemeDocument, accessories: SchemeDocument["accessories"]): SchemeDocument {
  return { ...doc, accessories };
}

/** The case, the wind system and the site, replaced together. */
export function setWorks(doc: SchemeDocument, works: Pick<SchemeDocument, "case" | "wind" | "site">): SchemeDocument {
  return { ...doc, case: works.case, wind: works.wind, site: works.site };
}


export function countStops(doc: SchemeDocument): number {
  return doc.divisions.reduce((n, d) => n + d.stops.length, 0);
}
