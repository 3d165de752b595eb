// The invented demo quotation: scheme A of St Aldric's priced with the invented demo rates, with lump
// sums, a provisional sum, two options and four stages. Every figure and word here is invented.
import type { Commercial } from "../lib/quote/commercial";

export const demoLogoSvg = `<svg xmlns="http://www.w3.org/2000/svg" width="360" height="96" viewBox="0 0 360 96">
  <g fill="none" stroke="#1d2433" stroke-width="5" stroke-linecap="round">
    <path d="M18 80V22"/><path d="M34 80V30"/><path d="M50 80V40"/><path d="M66 80V50"/>
  </g>
  <path d="M10 82h64" stroke="#b0852f" stroke-width="6" stroke-linecap="round"/>
  <text x="92" y="52" font-family="Source Serif 4" font-weight="600" font-size="34" fill="#1d2433">Corvin Lathe</text>
  <text x="94" y="78" font-family="Inter" font-size="15" letter-spacing="3" fill="#8a6622">ORGAN BUILDERS</text>
</svg>`;

export const demoCommercial: Commercial = {
  introduction:
    "Thank you for asking us to tender for the restoration of the organ at St Aldric's. Scheme A keeps the instrument as its builder left it in 1908: every stop is restored and regulated, the tired pneumatic action is converted to electro-pneumatic, and the console is restored with a modest combination system. (Invented demo tender.)",
  startDate: "2027-09-06",
  // Only what the estimate does not price itself: it prices the case, the wind system with the new blower, scaffolding and transport.
  lumpSums: [
    { id: "store", category: "transport", description: "Dry storage of the dismantled organ while the church roof is repaired", quantity: "12", unit: "week", unitPrice: "160.00" },
    { id: "stencil", category: "decoration", description: "Restoring the stencilled patterns on the front pipes", quantity: "1", unit: "item", unitPrice: "6850.00" },
  ],
  provisionalSums: [{ id: "woodworm", description: "Replacing wooden pipes found beyond repair when the chests are opened", amount: "5800.00" }],
  options: [
    { id: "cymbelstern", title: "Cymbelstern", description: "A star of eight tuned bells on the case, from a drawstop", price: "4650.00" },
    { id: "trumpet", title: "Trumpet 8′ on the Swell", description: "A new Trumpet on the existing spare slide", price: "18900.00" },
  ],
  exclusions: [
    "Builder's work, making good and redecoration of the gallery.",
    "Mains electrical supplies to the blower and action, to be installed by the parish's licensed electrician.",
    "Heating and humidity control of the church.",
  ],
  discount: { kind: "none", value: "" },
  validityDays: 90,
  currency: "EUR",
  tax: { treatment: "standard", percent: "20" },
  stages: [
    { id: "signing", label: "On signing the contract", percent: "25" },
    { id: "workshop", label: "On completion of the workshop work", percent: "30" },
    { id: "delivery", label: "On delivery to the church", percent: "25" },
    { id: "completion", label: "On completion of tonal finishing", percent: "20" },
  ],
};
