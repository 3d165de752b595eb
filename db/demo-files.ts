// The demo's survey files: pictures drawn here as SVG and rendered by sharp (no photographs), and a
// survey drawing made as a PDF with pdf-lib. The organ, the church and every mark are invented.
import { PDFDocument, StandardFonts, rgb } from "pdf-lib";
import sharp from "sharp";

const W = 1600;
const H = 1200;
const label = `<text x="${W - 24}" y="${H - 22}" text-anchor="end" font-family="DejaVu Sans, sans-serif" font-size="22" fill="#f7f4ec" opacity="0.75">Stopwright demo · generated image, not a photograph</text>`;

function svg(body: string, background: string): Buffer {
  return Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
    <defs>
      <radialGradient id="lamp" cx="0.45" cy="0.35" r="0.8"><stop offset="0" stop-color="#fff6df" stop-opacity="0.35"/><stop offset="1" stop-color="#000" stop-opacity="0.45"/></radialGradient>
      <linearGradient id="metal" x1="0" x2="1"><stop offset="0" stop-color="#8a929c"/><stop offset="0.35" stop-color="#d9dde2"/><stop offset="0.6" stop-color="#a9b0b8"/><stop offset="1" stop-color="#6d747d"/></linearGradient>
      <linearGradient id="brass" x1="0" x2="1"><stop offset="0" stop-color="#7d5d1f"/><stop offset="0.4" stop-color="#d8b35e"/><stop offset="1" stop-color="#8a6a2a"/></linearGradient>
      <linearGradient id="oak" x1="0" x2="1"><stop offset="0" stop-color="#5e3d22"/><stop offset="0.5" stop-color="#8a5d37"/><stop offset="1" stop-color="#5a3a20"/></linearGradient>
    </defs>
    <rect width="${W}" height="${H}" fill="${background}"/>
    ${body}
    <rect width="${W}" height="${H}" fill="url(#lamp)"/>
    ${label}
  </svg>`);
}

/** The console as found: two manuals, stop jambs with round knobs, a music desk. */
function consoleScene(): Buffer {
  const keys = (y: number) => {
    let out = `<rect x="300" y="${y}" width="1000" height="70" fill="#2a1a0e"/>`;
    for (let i = 0; i < 36; i++) out += `<rect x="${306 + i * 27.6}" y="${y + 4}" width="25" height="62" fill="${i % 9 === 4 ? "#d8cfb8" : "#efe7d2"}" stroke="#8c8270" stroke-width="1"/>`;
    for (let i = 0; i < 36; i++) if (![2, 6].includes(i % 7)) out += `<rect x="${325 + i * 27.6}" y="${y + 4}" width="14" height="38" fill="#1a1410"/>`;
    return out;
  };
  const jamb = (x: number) => {
    let out = `<rect x="${x}" y="300" width="190" height="470" fill="url(#oak)" stroke="#3a2614" stroke-width="4"/>`;
    for (let r = 0; r < 5; r++) for (let c = 0; c < 2; c++) out += `<circle cx="${x + 55 + c * 80}" cy="${350 + r * 88}" r="28" fill="#efe7d2" stroke="#5a4632" stroke-width="5"/><circle cx="${x + 55 + c * 80}" cy="${350 + r * 88}" r="10" fill="none" stroke="#9a8a70" stroke-width="2"/>`;
    return out;
  };
  return svg(
    `<rect x="180" y="180" width="1240" height="900" fill="url(#oak)"/>
     <rect x="420" y="220" width="760" height="170" fill="#6b4a2c" stroke="#3a2614" stroke-width="6"/>
     ${jamb(210)}${jamb(1200)}
     <rect x="290" y="760" width="1020" height="30" fill="#4a3019"/>${keys(790)}
     <rect x="290" y="860" width="1020" height="30" fill="#4a3019"/>${keys(890)}
     <path d="M300 1000 L1300 1000 L1380 1120 L220 1120 Z" fill="#3b2715"/>`,
    "#2b2520",
  );
}

/** Trumpet resonators of the bass octave on their blocks; one dented, one split at the seam. */
function resonatorScene(): Buffer {
  let body = `<rect x="0" y="980" width="${W}" height="220" fill="url(#oak)"/>`;
  for (let i = 0; i < 8; i++) {
    const x = 140 + i * 170;
    const top = 120 + i * 55;
    const half = 52 - i * 4;
    body += `<path d="M${x - half} ${top} L${x + half} ${top} L${x + 12} 960 L${x - 12} 960 Z" fill="url(#metal)" stroke="#4f565e" stroke-width="3"/>
             <rect x="${x - 22}" y="940" width="44" height="50" fill="url(#brass)"/>`;
    if (i === 2) body += `<ellipse cx="${x + 10}" cy="${top + 260}" rx="26" ry="44" fill="#5d646c" opacity="0.7"/>`;
    if (i === 5) body += `<path d="M${x} ${top + 40} L${x + 6} ${top + 200} L${x - 4} ${top + 330}" stroke="#1d2433" stroke-width="5" fill="none"/>`;
  }
  return svg(body, "#3a3631");
}

/** Mixture pipes on the Swell chest: a row of small flue pipes, three with their feet collapsed. */
function mixtureScene(): Buffer {
  let body = `<rect x="0" y="820" width="${W}" height="380" fill="#5a3a20"/><rect x="0" y="800" width="${W}" height="40" fill="url(#oak)"/>`;
  for (let row = 0; row < 3; row++) {
    for (let i = 0; i < 22; i++) {
      const x = 80 + i * 68 + row * 20;
      const h = 380 - i * 9 - row * 40;
      const base = 800 - row * 14;
      const lean = [6, 7, 15].includes(i) && row === 1 ? 28 : 0;
      body += `<path d="M${x} ${base} L${x + 12 + lean} ${base - 110} L${x + 12 + lean} ${base - 110 - h} L${x + 40 + lean} ${base - 110 - h} L${x + 40 + lean} ${base - 110} L${x + 52} ${base} Z" fill="url(#metal)" stroke="#4f565e" stroke-width="2" opacity="${1 - row * 0.18}"/>
               <rect x="${x + 16 + lean}" y="${base - 150}" width="20" height="12" fill="#1d2433" opacity="${1 - row * 0.18}"/>`;
    }
  }
  return svg(body, "#2e2a26");
}

/** Pedal Bourdon basses: large stopped wooden pipes with their stoppers' handles. */
function bourdonScene(): Buffer {
  let body = `<rect x="0" y="1040" width="${W}" height="160" fill="#3b2715"/>`;
  for (let i = 0; i < 6; i++) {
    const x = 90 + i * 250;
    const w = 200 - i * 14;
    const top = 90 + i * 60;
    body += `<rect x="${x}" y="${top}" width="${w}" height="${1040 - top}" fill="url(#oak)" stroke="#2f1d0e" stroke-width="5"/>
             <rect x="${x + w * 0.15}" y="${top + 560 - i * 30}" width="${w * 0.7}" height="70" fill="#2a1a0e"/>
             <rect x="${x + w * 0.4}" y="${top - 60}" width="${w * 0.2}" height="60" fill="#6b4a2c" stroke="#2f1d0e" stroke-width="4"/>`;
  }
  return svg(body, "#26221e");
}

/** A survey drawing: the case in plan at impost level, 1:20, with the chests' outlines and a title block. */
async function casePlanPdf(): Promise<Buffer> {
  const pdf = await PDFDocument.create();
  pdf.setTitle("St Aldric's, Wexmoor — organ case, plan at impost level (invented survey drawing)");
  pdf.setProducer("Stopwright demo data");
  const page = pdf.addPage([842, 595]); // A4 landscape, points
  const font = await pdf.embedFont(StandardFonts.Helvetica);
  const ink = rgb(0.11, 0.14, 0.2);
  const mm = 842 / 297;
  // 1:20 — the case is 4.4 m wide and 2.2 m deep, so 220 × 110 mm on the sheet.
  const ox = 40 * mm;
  const oy = 50 * mm;
  page.drawRectangle({ x: ox, y: oy, width: 220 * mm, height: 110 * mm, borderColor: ink, borderWidth: 1.5 });
  page.drawRectangle({ x: ox + 10 * mm, y: oy + 60 * mm, width: 95 * mm, height: 36 * mm, borderColor: ink, borderWidth: 0.8, borderDashArray: [4, 3] });
  page.drawRectangle({ x: ox + 115 * mm, y: oy + 60 * mm, width: 95 * mm, height: 36 * mm, borderColor: ink, borderWidth: 0.8, borderDashArray: [4, 3] });
  page.drawRectangle({ x: ox + 10 * mm, y: oy + 12 * mm, width: 200 * mm, height: 34 * mm, borderColor: ink, borderWidth: 0.8, borderDashArray: [4, 3] });
  const text = (s: string, x: number, y: number, size = 9) => page.drawText(s, { x, y, size, font, color: ink });
  text("Great chest (C side)", ox + 14 * mm, oy + 80 * mm);
  text("Great chest (C# side)", ox + 119 * mm, oy + 80 * mm);
  text("Swell box above; Pedal chest behind, at floor level", ox + 14 * mm, oy + 28 * mm);
  page.drawLine({ start: { x: ox, y: oy - 8 * mm }, end: { x: ox + 220 * mm, y: oy - 8 * mm }, thickness: 0.6, color: ink });
  text("4400 mm inside the case", ox + 92 * mm, oy - 13 * mm);
  page.drawRectangle({ x: 200 * mm, y: 12 * mm, width: 85 * mm, height: 28 * mm, borderColor: ink, borderWidth: 1 });
  text("St Aldric's, Wexmoor (invented)", 203 * mm, 33 * mm, 10);
  text("Organ case — plan at impost level", 203 * mm, 26 * mm);
  text("Survey drawing, scale 1:20 on A4", 203 * mm, 20 * mm);
  text("Stopwright demo data — not a real building", 203 * mm, 14 * mm, 7);
  return Buffer.from(await pdf.save());
}

export type DemoFile = {
  name: string;
  bytes: () => Promise<Buffer>;
  caption: string;
  category: "photo" | "drawing" | "document";
  link?: { divisionId?: string; stopId?: string };
  shared?: boolean;
};

/** St Aldric's survey, linked to scheme A ("Restore as found"), the scheme that describes the organ as it stands. */
export const parishSurveyFiles: DemoFile[] = [
  {
    name: "console-as-found.jpg",
    bytes: () => sharp(consoleScene()).jpeg({ quality: 82 }).toBuffer(),
    caption: "Console as found: two manuals and drawstop jambs; key covers worn on the Great (generated image, invented).",
    category: "photo",
    shared: true,
  },
  {
    name: "great-trumpet-resonators.jpg",
    bytes: () => sharp(resonatorScene()).jpeg({ quality: 82 }).toBuffer(),
    caption: "Great Trumpet, bass octave: one resonator dented, one split along the seam (generated image, invented).",
    category: "photo",
    link: { stopId: "gt-tr" },
  },
  {
    name: "swell-mixture-feet.webp",
    bytes: () => sharp(mixtureScene()).webp({ quality: 80 }).toBuffer(),
    caption: "Swell Mixture: three pipe feet collapsed at the toe (generated image, invented).",
    category: "photo",
    link: { stopId: "sw-mx" },
  },
  {
    name: "pedal-bourdon-basses.png",
    bytes: () => sharp(bourdonScene()).resize(1000).png({ compressionLevel: 9, palette: true }).toBuffer(),
    caption: "Pedal division: Bourdon basses at the back of the case; stoppers loose (generated image, invented).",
    category: "photo",
    link: { divisionId: "ped" },
  },
  {
    name: "case-plan-1-20.pdf",
    bytes: casePlanPdf,
    caption: "Case plan at impost level, 1:20, with the chests' outlines (invented survey drawing).",
    category: "drawing",
  },
];
