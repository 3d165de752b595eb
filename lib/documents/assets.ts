/**
 * What the documents need from disk, read once per process: the shipped TTF fonts (assets/fonts,
 * SIL Open Font License, from the @expo-google-fonts packages of Inter and Source Serif 4) and the
 * SVG renderer's WebAssembly. Server-side only; the document builders themselves stay pure.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { initWasm, Resvg } from "@resvg/resvg-wasm";

const root = () => process.cwd();

export interface DocumentFonts {
  readonly serif: { readonly regular: Buffer; readonly italic: Buffer; readonly bold: Buffer; readonly boldItalic: Buffer };
  readonly sans: { readonly regular: Buffer; readonly bold: Buffer };
}

let fonts: DocumentFonts | undefined;

export function documentFonts(): DocumentFonts {
  const f = (name: string) => readFileSync(join(root(), "assets", "fonts", name));
  fonts ??= {
    serif: {
      regular: f("SourceSerif4_400Regular.ttf"),
      italic: f("SourceSerif4_400Regular_Italic.ttf"),
      bold: f("SourceSerif4_600SemiBold.ttf"),
      boldItalic: f("SourceSerif4_600SemiBold_Italic.ttf"),
    },
    sans: { regular: f("Inter_400Regular.ttf"), bold: f("Inter_600SemiBold.ttf") },
  };
  return fonts;
}

let ready: Promise<void> | undefined;

function svgRenderer(): Promise<void> {
  ready ??= initWasm(readFileSync(join(root(), "node_modules", "@resvg", "resvg-wasm", "index_bg.wasm")));
  return ready;
}

type Png = { png: Buffer; width: number; height: number };
// The last pictures drawn: an issued quotation's programme is the same picture every time its tender is written.
const drawn = new Map<string, Png>();

/** An SVG drawn to PNG at the given pixel width, with the shipped fonts (no system fonts, so every machine draws it alike). */
export async function svgToPng(svg: string, width: number): Promise<Png> {
  const key = `${width}:${svg}`;
  const hit = drawn.get(key);
  if (hit) return hit;
  const out = await draw(svg, width);
  if (drawn.size >= 16) drawn.delete(drawn.keys().next().value!);
  drawn.set(key, out);
  return out;
}

async function draw(svg: string, width: number): Promise<Png> {
  await svgRenderer();
  const f = documentFonts();
  const r = new Resvg(svg, {
    fitTo: { mode: "width", value: width },
    font: { fontBuffers: [f.sans.regular, f.sans.bold, f.serif.regular, f.serif.bold], defaultFontFamily: "Inter", sansSerifFamily: "Inter", serifFamily: "Source Serif 4", loadSystemFonts: false } as never,
  });
  const img = r.render();
  const out = { png: Buffer.from(img.asPng()), width: img.width, height: img.height };
  img.free();
  r.free();
  return out;
}
