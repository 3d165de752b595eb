/**
 * Writing a quotation's documents to .docx bytes: the tender (with the programme picture), the internal
 * cost sheet and the workshop's work list. Server-side (fonts and the SVG renderer come from disk);
 * everything a document says comes from the quotation object, so an issued quotation's documents are
 * the same whenever they are written.
 */
import { Packer, type Document } from "docx";
import { zipSync, type ZipOptions } from "fflate";
import type { DocumentKind } from "@/lib/quote/access";
import { programmeSvg } from "@/lib/quote/programme-chart";
import type { Quotation } from "@/lib/quote/quotation";
import { documentFonts, svgToPng } from "./assets";
import { costSheetDocument } from "./cost-sheet";
import { tenderDocument } from "./tender";
import { workListDocument } from "./work-list";

export const DOCX_TYPE = "application/vnd.openxmlformats-officedocument.wordprocessingml.document";

type Compiler = { compile(file: Document, prettify?: unknown, overrides?: unknown[]): Map<string, string | Uint8Array> };

/**
 * Packs a document as docx does, but zips it ourselves: the embedded fonts (most of the bytes) with
 * fast compression and pictures stored as they are, which takes the tender from about a second to a
 * fraction of one; and every entry dated `date`, so the same quotation gives the same zip entries.
 */
export function packDocument(doc: Document, date: Date): Buffer {
  const compiler = (Packer as unknown as { compiler?: Compiler }).compiler;
  if (!compiler) throw new Error("docx no longer exposes its compiler; pack with Packer.toBuffer instead.");
  const files = compiler.compile(doc, undefined, []);
  const enc = new TextEncoder();
  const entries: Record<string, [Uint8Array, ZipOptions]> = {};
  const stamp = date.toISOString().replace(/\.\d{3}Z$/, "Z");
  for (const [path, raw] of files) {
    // The document's own dates are the quotation's, not the moment it was written.
    const data = path === "docProps/core.xml" && typeof raw === "string"
      ? raw.replace(/(<dcterms:(?:created|modified)[^>]*>)[^<]*(<\/dcterms:(?:created|modified)>)/g, `$1${stamp}$2`)
      : raw;
    const bytes = typeof data === "string" ? enc.encode(data) : data;
    const level = path.endsWith(".odttf") || /\.(png|jpe?g)$/.test(path) ? 0 : 1;
    entries[path] = [bytes, { level, mtime: date }];
  }
  return Buffer.from(zipSync(entries));
}

function dateOf(q: Quotation): Date {
  // Zip dates are local DOS times from 1980; noon keeps the day the same in any time zone.
  return new Date(`${q.issuedOn ?? "2000-01-01"}T12:00:00Z`);
}

export async function writeDocument(kind: DocumentKind, q: Quotation): Promise<Buffer> {
  const fonts = documentFonts();
  if (kind === "tender") {
    const picture = await svgToPng(programmeSvg(q.estimate.programme, { width: 720 }), 1440);
    return packDocument(tenderDocument(q, fonts, { programme: picture }), dateOf(q));
  }
  if (kind === "cost-sheet") return packDocument(costSheetDocument(q, fonts), dateOf(q));
  return packDocument(workListDocument(q, fonts), dateOf(q));
}

/** "tender-Q-2027-0004.docx". */
export function documentFileName(kind: DocumentKind, q: Pick<Quotation, "number" | "status">): string {
  return `${kind}-${q.number}${q.status === "draft" ? "-draft" : ""}.docx`;
}
