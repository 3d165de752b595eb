import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { pitchBesideName, stopTitle } from "@/components/spec/format";
import { Pitch } from "@/components/spec/pitch";

// How stop lists print a stop with its pitch: common practice, no source.
describe("a stop's name with its pitch", () => {
  it("adds the pitch to a plain name", () => {
    expect(stopTitle({ name: "Principal", footage: "8", family: "principal" })).toBe("Principal 8′");
    expect(stopTitle({ name: "Nazard", footage: "2 2/3", family: "flute" })).toBe("Nazard 2⅔′");
    expect(stopTitle({ name: "Mixture", footage: "2", ranks: 4, family: "mixture" })).toBe("Mixture IV");
  });

  it("does not repeat the ranks a mixture's name already carries, and gives its footage instead", () => {
    expect(stopTitle({ name: "Mixture III", footage: "1 1/3", ranks: 3, family: "mixture" })).toBe("Mixture III 1⅓′");
    expect(pitchBesideName({ name: "Mixture III", footage: "1 1/3", ranks: 3, family: "mixture" })).toBe("1⅓′");
    expect(stopTitle({ name: "Sharp Mixture iii", footage: "1", ranks: 3, family: "mixture" })).toBe("Sharp Mixture iii 1′");
    const progressive = { footage: "2", ranks: 5, family: "mixture", breaks: [{ footages: ["2", "1 1/3", "1", null, null] }, { footages: ["2", "1 1/3", "1", "2/3", "1/2"] }] };
    expect(stopTitle({ name: "Plein Jeu III-V", ...progressive })).toBe("Plein Jeu III-V 2′");
    expect(stopTitle({ name: "Plein Jeu", ...progressive })).toBe("Plein Jeu III–V");
  });

  it("gives a compound stop named with its ranks its footage only", () => {
    expect(stopTitle({ name: "Sesquialtera II", footage: "2 2/3", ranks: 2, family: "mutation" })).toBe("Sesquialtera II 2⅔′");
    expect(stopTitle({ name: "Sesquialtera", footage: "2 2/3", ranks: 2, family: "mutation" })).toBe("Sesquialtera 2⅔′ II");
    // A name ending in a word that only looks like a numeral of other ranks keeps the full pitch.
    expect(stopTitle({ name: "Cornet V", footage: "8", ranks: 3, family: "mutation" })).toBe("Cornet V 8′ III");
  });
});

describe("the pitch on a stop card", () => {
  // The markup is one <span>; its text lies between the end of the opening tag and the closing tag.
  const text = (stop: Parameters<typeof Pitch>[0]["stop"]) => {
    const html = renderToStaticMarkup(createElement(Pitch, { stop }));
    return html.slice(html.indexOf(">") + 1, html.lastIndexOf("</span>"));
  };

  it("shows the footage beside a mixture named with its ranks, and the ranks beside one that is not", () => {
    expect(text({ name: "Mixture IV", footage: "1 1/3", ranks: 4, family: "mixture" })).toBe("1⅓′");
    expect(text({ name: "Mixture", footage: "1 1/3", ranks: 4, family: "mixture" })).toBe("IV");
    expect(text({ name: "Principal", footage: "8", family: "principal" })).toBe("8′");
  });
});
