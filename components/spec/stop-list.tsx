/** A scheme's stop list in the trade's usual layout: divisions with compass and details, stops numbered throughout. */
import type { SchemeDocument } from "@/lib/spec/document";
import { actionLabels, couplerName, chestTypeLabels, compassText, materialLabels, noteText, pitchBesideName, resonatorLengthLabels, workLabels, windText } from "./format";
import { Treatment } from "./treatment-mark";

export function StopList({ doc }: { doc: SchemeDocument }) {
  const numberOf = new Map<string, number>();
  let n = 0;
  // Removed stops are listed (struck through) but not numbered: the numbers are the stops the organ will have.
  for (const d of doc.divisions) for (const s of d.stops) if (s.origin !== "removed") numberOf.set(s.id, ++n);
  const divisionOfStop = new Map<string, string>();
  for (const d of doc.divisions) for (const s of d.stops) divisionOfStop.set(s.id, d.name);
  const acc = doc.accessories;
  let next = n;
  const combination = acc.combination;
  return (
    <div className="font-serif text-[15px] leading-snug text-ink" data-testid="stop-list">
      <div className="columns-1 gap-10 md:columns-2 print:columns-2">
        {doc.divisions.map((d) => (
          <section key={d.id} className="mb-6 break-inside-avoid" data-testid={`list-division-${d.name}`}>
            <h2 className="text-lg font-semibold uppercase tracking-wider">{d.name}</h2>
            <p className="mb-1.5 text-sm italic text-ink-soft">
              {compassText(d.compass)} · {actionLabels[d.action]} action · {chestTypeLabels[d.chest].toLowerCase()} · wind {windText(d.windPressure)}
              {d.enclosed && " · enclosed in a swell box"}
            </p>
            {d.stops.length === 0 ? (
              <p className="text-sm italic text-tin">No stops.</p>
            ) : (
              <table className="w-full border-collapse">
                <tbody>
                  {d.stops.map((s) => {
                    const note: string[] = [];
                    if (s.compass) note.push(`from ${noteText(s.compass.low)}`);
                    if (s.source && numberOf.has(s.source) && (s.origin === "extension" || s.origin === "borrowed")) {
                      const srcDiv = divisionOfStop.get(s.source);
                      note.push(s.origin === "extension" ? `extension of no. ${numberOf.get(s.source)}` : `from ${srcDiv !== d.name ? `the ${srcDiv}, ` : ""}no. ${numberOf.get(s.source)}`);
                    }
                    if (s.bass) note.push(`${s.bass.notes} basses of ${materialLabels[s.bass.material].toLowerCase()}`);
                    if (s.construction === "reed" && s.resonator && s.resonator.length !== "full") note.push(`${resonatorLengthLabels[s.resonator.length].toLowerCase()} resonators`);
                    if (s.fluesFrom) note.push(`flue trebles from ${noteText(s.fluesFrom)}`);
                    if (s.duplex) note.push("duplexed");
                    return (
                      <tr key={s.id} className="align-baseline" data-testid={`list-stop-${s.name}`}>
                        <td className="num w-8 pr-2 text-right text-ink-soft">{numberOf.has(s.id) ? `${numberOf.get(s.id)}.` : ""}</td>
                        <td className={`pr-2 ${s.origin === "removed" ? "line-through" : ""}`}>
                          {s.name}
                          {note.length > 0 && <span className="text-sm italic text-ink-soft"> ({note.join("; ")})</span>}
                        </td>
                        <td className="num w-16 whitespace-nowrap pr-3 text-right">{pitchBesideName(s)}</td>
                        <td className="w-40 font-sans text-xs text-ink-soft"><Treatment stop={s} /></td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            )}
          </section>
        ))}
      </div>
      {(acc.couplers.length > 0 || acc.tremulants.length > 0) && (
        <section className="mb-6 break-inside-avoid" data-testid="list-accessories">
          <h2 className="text-lg font-semibold uppercase tracking-wider">Couplers and accessories</h2>
          <table className="border-collapse">
            <tbody>
              {acc.couplers.map((c) => (
                <tr key={c.id}>
                  <td className="num w-8 pr-2 text-right text-ink-soft">{++next}.</td>
                  <td>{couplerName(c, doc.divisions)}</td>
                </tr>
              ))}
              {acc.tremulants.map((t) => (
                <tr key={t.id}>
                  <td className="num w-8 pr-2 text-right text-ink-soft">{++next}.</td>
                  <td>Tremulant ({doc.divisions.find((d) => d.id === t.division)?.name ?? "?"})</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}
      <section className="break-inside-avoid text-sm">
        <h2 className="text-lg font-semibold uppercase tracking-wider">Console</h2>
        <p>
          Console {workLabels[acc.consoleWork].toLowerCase()}.
          {combination.generalPistons > 0 && ` ${combination.generalPistons} general pistons.`}
          {combination.divisionalPistons > 0 && ` ${combination.divisionalPistons} divisional pistons to each division.`}
          {combination.memoryLevels > 0 && ` Combination system with ${combination.memoryLevels} memory levels.`}
        </p>
      </section>
      <section className="mt-4 break-inside-avoid text-sm" data-testid="list-case-wind">
        <h2 className="text-lg font-semibold uppercase tracking-wider">Case and wind</h2>
        <p>
          {doc.case.work === "none" ? "No case work." : `Case ${workLabels[doc.case.work].toLowerCase()}.`}
          {doc.case.dummyPipes > 0 && ` ${doc.case.dummyPipes} new display pipes in ${materialLabels[doc.case.frontMetal].toLowerCase()}.`}
          {doc.case.gildingM2 > 0 && " Gilding renewed."}
          {` Wind system ${workLabels[doc.wind.work].toLowerCase()}${doc.wind.blower === "new" ? ", with a new blower" : ""}.`}
        </p>
      </section>
    </div>
  );
}
