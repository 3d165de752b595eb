import { describe, expect, it } from "vitest";
import { composeMail } from "./compose";

describe("composing a message", () => {
  it("says the same in text and HTML, with every link in both", () => {
    const m = composeMail({ greeting: "Dear Ada,", paragraphs: ["One.", "Two."], links: [{ label: "Open", url: "https://x.example/a?b=1&c=2" }], signature: "The firm" });
    expect(m.text).toBe("Dear Ada,\n\nOne.\n\nTwo.\n\nOpen:\nhttps://x.example/a?b=1&c=2\n\nThe firm");
    expect(m.html).toContain('href="https://x.example/a?b=1&amp;c=2"');
    expect(m.links).toEqual([{ label: "Open", url: "https://x.example/a?b=1&c=2" }]);
  });

  it("escapes what people typed, so a comment cannot inject markup", () => {
    const m = composeMail({ paragraphs: ['<script>alert("x")</script> & more'] });
    expect(m.html).not.toContain("<script>");
    expect(m.html).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; more");
    expect(m.text).toContain('<script>alert("x")</script> & more');
  });
});
