/**
 * The house style of Stopwright's Word documents (the `docx` package): Source Serif 4 for the text and
 * headings, Inter for tables and figures, ink and brass from the product's palette, A4 with generous
 * margins, a running header with the firm and the quotation number, and "page N of M" in the footer.
 * The builders here are pure: fonts and pictures are handed in as bytes.
 */
import {
  AlignmentType, BorderStyle, LineRuleType, TabStopType as Tabs, Document, Footer, Header, HeadingLevel, LevelFormat, PageNumber, Paragraph, ShadingType, Table, TableCell,
  TableLayoutType, TableRow, TabStopType, TextRun, WidthType, type FileChild, type IRunOptions, type ISectionOptions,
} from "docx";
import { currencySign } from "@/lib/quote/currency";
import { formatAmount } from "@/lib/quote/totals";
import type { DocumentFonts } from "./assets";
import { groupThousands } from "@/lib/spec/digits";

export const SERIF = "Source Serif 4";
export const SANS = "Inter";
export const INK = "1D2433";
export const SOFT = "3A4356";
export const TIN = "6B737D";
export const BRASS = "8A6622";
export const RULE = "D9D3C4";
export const PAPER = "F4EFE3";
export const CLASH = "C2412D";
/** Table text: Inter at 8.5 pt (half-points). */
const CELL_SIZE = 17;

/** A4 in twentieths of a point, with 22 mm side margins: 11 906 × 16 838 twips. */
export const PAGE = { width: 11906, height: 16838, margin: 1247 };
export const TEXT_WIDTH = PAGE.width - 2 * PAGE.margin;

type RunOpts = Omit<IRunOptions, "text" | "children">;

export function run(text: string, opts: RunOpts = {}): TextRun {
  return new TextRun({ text, ...opts });
}

export function para(content: string | (TextRun | string)[], opts: { style?: string; align?: (typeof AlignmentType)[keyof typeof AlignmentType]; after?: number; before?: number; keepNext?: boolean; run?: RunOpts; indent?: number } = {}): Paragraph {
  const children = (typeof content === "string" ? [content] : content).map((c) => (typeof c === "string" ? run(c, opts.run) : c));
  return new Paragraph({
    children,
    style: opts.style,
    alignment: opts.align,
    keepNext: opts.keepNext,
    spacing: { after: opts.after ?? 120, before: opts.before },
    ...(opts.indent ? { indent: { left: opts.indent } } : {}),
  });
}

export function heading(text: string, level: 1 | 2 | 3 = 1): Paragraph {
  return new Paragraph({
    text,
    heading: level === 1 ? HeadingLevel.HEADING_1 : level === 2 ? HeadingLevel.HEADING_2 : HeadingLevel.HEADING_3,
    keepNext: true,
    keepLines: true,
  });
}

export function bullet(content: string | (TextRun | string)[]): Paragraph {
  const children = (typeof content === "string" ? [content] : content).map((c) => (typeof c === "string" ? run(c) : c));
  return new Paragraph({ children, numbering: { reference: "bullets", level: 0 }, spacing: { after: 60 } });
}

export type Cell = string | { text: string | TextRun[]; bold?: boolean; italic?: boolean; align?: "left" | "right" | "center"; span?: number; shade?: string; color?: string; strike?: boolean };

const thin = { style: BorderStyle.SINGLE, size: 4, color: RULE };
const none = { style: BorderStyle.NONE, size: 0, color: "FFFFFF" };

/**
 * A table in the house style: a header row in small capitals on paper shading, hairlines between rows,
 * figures right-aligned in Inter. `widths` are fractions of the text width.
 */
export function table(header: Cell[] | null, rows: Cell[][], widths: number[], opts: { total?: boolean; fontSize?: number } = {}): Table {
  const size = opts.fontSize ?? CELL_SIZE;
  const cols = widths.map((w) => Math.round(w * TEXT_WIDTH));
  // Body cells carry only what differs from the "Cell" paragraph styles and the table's own borders and
  // margins: a 150-stop tender has about a thousand cells, and their XML is most of the writing time.
  const cell = (c: Cell, i: number, kind: "head" | "body" | "total"): TableCell => {
    const o = typeof c === "string" ? { text: c } : c;
    const runs = typeof o.text === "string"
      ? [kind === "head"
          ? run(o.text, { size: size - 2, bold: true, color: SOFT, allCaps: true })
          : run(o.text, { ...(size !== CELL_SIZE ? { size } : {}), ...(kind === "total" || o.bold ? { bold: true } : {}), ...(o.italic ? { italics: true } : {}), ...(o.color && o.color !== INK ? { color: o.color } : {}), ...(o.strike ? { strike: true } : {}) })]
      : o.text;
    const style = o.align === "right" ? "CellRight" : o.align === "center" ? "CellCenter" : "Cell";
    return new TableCell({
      children: [new Paragraph({ children: runs, style })],
      columnSpan: o.span,
      width: { size: cols.slice(i, i + (o.span ?? 1)).reduce((a, b) => a + b, 0), type: WidthType.DXA },
      ...(kind === "head" ? { shading: { type: ShadingType.CLEAR, color: "auto", fill: PAPER }, borders: { bottom: { style: BorderStyle.SINGLE, size: 6, color: INK } } } : {}),
      ...(kind === "total" ? { borders: { top: { style: BorderStyle.SINGLE, size: 8, color: INK } } } : {}),
      ...(kind === "body" && o.shade ? { shading: { type: ShadingType.CLEAR, color: "auto", fill: o.shade } } : {}),
    });
  };
  const trs: TableRow[] = [];
  const indexed = (cells: Cell[], kind: "head" | "body" | "total") => {
    let i = 0;
    return cells.map((c) => {
      const out = cell(c, i, kind);
      i += typeof c === "string" ? 1 : (c.span ?? 1);
      return out;
    });
  };
  if (header) {
    // A header over a column of figures stands right, as the figures do.
    const first = rows[0] ?? [];
    const aligned = header.map((h, i): Cell => {
      const below = first[i];
      const align = below && typeof below !== "string" ? below.align : undefined;
      return typeof h === "string" ? { text: h, align } : h;
    });
    trs.push(new TableRow({ children: indexed(aligned, "head"), tableHeader: true, cantSplit: true }));
  }
  rows.forEach((r, k) => trs.push(new TableRow({ children: indexed(r, opts.total && k === rows.length - 1 ? "total" : "body"), cantSplit: true })));
  return new Table({
    rows: trs, columnWidths: cols, width: { size: TEXT_WIDTH, type: WidthType.DXA }, layout: TableLayoutType.FIXED,
    margins: { left: 80, right: 80, top: 20, bottom: 20 },
    borders: { top: none, left: none, right: none, bottom: thin, insideHorizontal: thin, insideVertical: none },
  });
}

/** An amount in a table cell, right-aligned: "€ 1 200.00". */
export function moneyCell(amount: string, currency: string, opts: { bold?: boolean } = {}): Cell {
  return { text: `${currencyPrefix(currency)}${formatMoney(amount)}`, align: "right", bold: opts.bold };
}

/** A narrow no-break space: groups thousands and joins a currency sign to its amount, so neither is split at a line end. */
export const NNBSP = "\u202f";

export function currencyPrefix(code: string): string {
  return `${currencySign(code)}${NNBSP}`;
}

/** Narrow spaces between thousands; the cents as computed, never through a float (one formatter: lib/quote/totals.ts). */
export const formatMoney = formatAmount;

/** 12 345.6 with a thin space between thousands (toLocaleString is slow enough to show in a long table). */
export function formatCount(n: number, digits = 0): string {
  const fixed = Math.abs(n).toFixed(digits);
  const [whole, fraction] = fixed.split(".");
  return `${n < 0 && Number(fixed) !== 0 ? "−" : ""}${groupThousands(whole!, NNBSP)}${fraction ? `.${fraction}` : ""}`;
}

export function spacer(after = 120): Paragraph {
  return new Paragraph({ children: [], spacing: { after } });
}

function runningHeader(left: string, right: string): Header {
  return new Header({
    children: [
      new Paragraph({
        tabStops: [{ type: TabStopType.RIGHT, position: TEXT_WIDTH }],
        border: { bottom: { style: BorderStyle.SINGLE, size: 4, color: RULE, space: 4 } },
        children: [run(left, { font: SANS, size: 15, color: TIN }), run(`\t${right}`, { font: SANS, size: 15, color: TIN })],
      }),
    ],
  });
}

function runningFooter(note: string): Footer {
  return new Footer({
    children: [
      new Paragraph({
        tabStops: [{ type: TabStopType.RIGHT, position: TEXT_WIDTH }],
        children: [
          run(note, { font: SANS, size: 14, color: TIN }),
          new TextRun({ children: ["\tPage ", PageNumber.CURRENT, " of ", PageNumber.TOTAL_PAGES], font: SANS, size: 14, color: TIN }),
        ],
      }),
    ],
  });
}

export interface DocumentFrame {
  readonly title: string;
  readonly subject: string;
  readonly headerLeft: string;
  readonly headerRight: string;
  readonly footerNote: string;
  /** The first section (e.g. a cover) without the running header. */
  readonly cover?: readonly FileChild[];
  readonly body: readonly FileChild[];
  readonly landscape?: boolean;
}

/** A document in the house style, with the shipped fonts embedded so it looks the same in any word processor. */
export function houseDocument(frame: DocumentFrame, fonts: DocumentFonts, creator: string): Document {
  const page = frame.landscape
    ? { size: { width: PAGE.height, height: PAGE.width, orientation: "landscape" as const }, margin: { top: 1134, bottom: 1134, left: 1134, right: 1134, header: 567, footer: 567 } }
    : { size: { width: PAGE.width, height: PAGE.height }, margin: { top: 1304, bottom: 1247, left: PAGE.margin, right: PAGE.margin, header: 624, footer: 567 } };
  const sections: ISectionOptions[] = [];
  if (frame.cover) sections.push({ properties: { page }, footers: { default: runningFooter(frame.footerNote) }, children: [...frame.cover] });
  sections.push({
    properties: { page },
    headers: { default: runningHeader(frame.headerLeft, frame.headerRight) },
    footers: { default: runningFooter(frame.footerNote) },
    children: [...frame.body],
  });
  return new Document({
    creator,
    title: frame.title,
    subject: frame.subject,
    description: frame.subject,
    fonts: [
      { name: SERIF, data: fonts.serif.regular, italic: fonts.serif.italic, bold: fonts.serif.bold, boldItalic: fonts.serif.boldItalic },
      { name: SANS, data: fonts.sans.regular, bold: fonts.sans.bold },
    ],
    numbering: {
      config: [
        { reference: "bullets", levels: [{ level: 0, format: LevelFormat.BULLET, text: "–", alignment: AlignmentType.LEFT, style: { paragraph: { indent: { left: 360, hanging: 240 } } } }] },
      ],
    },
    styles: {
      default: {
        document: { run: { font: SERIF, size: 21, color: INK }, paragraph: { spacing: { line: 276, lineRule: LineRuleType.AUTO } } },
        heading1: { run: { font: SERIF, size: 32, bold: true, color: INK }, paragraph: { spacing: { before: 360, after: 140 } } },
        heading2: { run: { font: SERIF, size: 25, bold: true, color: INK }, paragraph: { spacing: { before: 240, after: 100 } } },
        heading3: { run: { font: SANS, size: 17, bold: true, color: BRASS, allCaps: true }, paragraph: { spacing: { before: 200, after: 80 } } },
        title: { run: { font: SERIF, size: 52, bold: true, color: INK }, paragraph: { spacing: { after: 120 } } },
      },
      paragraphStyles: [
        { id: "Cell", name: "Table text", basedOn: "Normal", run: { font: SANS, size: CELL_SIZE, color: INK }, paragraph: { spacing: { before: 30, after: 30, line: 240, lineRule: LineRuleType.AUTO } } },
        { id: "CellRight", name: "Table figure", basedOn: "Cell", paragraph: { alignment: AlignmentType.RIGHT } },
        { id: "CellCenter", name: "Table centred", basedOn: "Cell", paragraph: { alignment: AlignmentType.CENTER } },
        { id: "Small", name: "Small", basedOn: "Normal", run: { font: SANS, size: 16, color: SOFT }, paragraph: { spacing: { after: 60 } } },
        { id: "Lead", name: "Lead", basedOn: "Normal", run: { size: 24, italics: true, color: SOFT }, paragraph: { spacing: { after: 200 } } },
      ],
    },
    sections,
  });
}

/** "Name: ____________": a label and a ruled line to sign on, aligned with the lines above and below. */
export function signatureLine(label: string): Paragraph {
  return new Paragraph({
    tabStops: [{ type: Tabs.LEFT, position: 1500 }, { type: Tabs.RIGHT, position: 7600, leader: "underscore" }],
    children: [run(`${label}:`, { font: SANS, size: 18, color: SOFT }), run("\t\t", { font: SANS, size: 18, color: TIN })],
    spacing: { before: 160, after: 160 },
  });
}

/** The cover's title: large serif, its own spacing so long names wrap cleanly. */
export function coverTitle(text: string): Paragraph {
  return new Paragraph({ children: [run(text, { font: SERIF, size: 52, bold: true, color: INK })], spacing: { after: 120, line: 260, lineRule: LineRuleType.AUTO }, keepNext: true });
}

/** A rule of brass, as under the cover's title. */
export function brassRule(): Paragraph {
  return new Paragraph({ children: [], border: { bottom: { style: BorderStyle.SINGLE, size: 12, color: "B0852F", space: 1 } }, spacing: { after: 240 } });
}
