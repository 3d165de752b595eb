import { describe, expect, it } from "vitest";
import { changesState, foreignOriginProblem, isJsonContentType } from "@/lib/server/request-checks";

const own = "http://127.0.0.1:3000";
const h = (init: Record<string, string>) => new Headers(init);

describe("request checks", () => {
  it("treats every method but GET, HEAD and OPTIONS as a change", () => {
    expect(["POST", "PUT", "PATCH", "DELETE", "post"].every(changesState)).toBe(true);
    expect(["GET", "HEAD", "OPTIONS"].some(changesState)).toBe(false);
  });

  it("accepts the app's own origin and refuses any other, another port and 'null' included", () => {
    expect(foreignOriginProblem(h({ origin: own }), own)).toBeNull();
    for (const origin of ["http://127.0.0.1:3001", "https://127.0.0.1:3000", "http://localhost:3000", "null", "http://127.0.0.1:3000.evil.example"]) {
      expect(foreignOriginProblem(h({ origin }), own), origin).toMatch(/another site/);
    }
  });

  it("without an Origin, refuses what the browser marks cross-site or same-site, and lets programs through", () => {
    expect(foreignOriginProblem(h({ "sec-fetch-site": "cross-site" }), own)).toMatch(/another site/);
    expect(foreignOriginProblem(h({ "sec-fetch-site": "same-site" }), own)).toMatch(/another site/);
    expect(foreignOriginProblem(h({ "sec-fetch-site": "same-origin" }), own)).toBeNull();
    expect(foreignOriginProblem(h({}), own)).toBeNull();
  });

  it("knows JSON by its media type, with or without parameters", () => {
    expect(isJsonContentType("application/json")).toBe(true);
    expect(isJsonContentType("Application/JSON; charset=utf-8")).toBe(true);
    for (const t of [null, "", "text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", "application/jsonp", "text/json"]) {
      expect(isJsonContentType(t), String(t)).toBe(false);
    }
  });
});
