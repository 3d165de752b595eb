// Path parameters and the return path after sign-in: only the canonical spelling of an id or a
// revision number passes, and only a path on this site is a place to return to.
import { describe, expect, it } from "vitest";
import { idParam, revisionParams, safeReturnPath, versionParam } from "@/lib/server/params";

describe("revision numbers", () => {
  it("take plain decimal within PostgreSQL's integer, and nothing else", () => {
    for (const [raw, value] of [["1", 1], ["42", 42], ["2147483647", 2147483647]] as const) expect(versionParam.parse(raw)).toBe(value);
    for (const raw of ["0", "01", "-1", "+1", " 1", "1 ", "0x1", "1e0", "1.0", "2147483648", "99999999999999999999", "", "١"]) {
      expect(versionParam.safeParse(raw).success, JSON.stringify(raw)).toBe(false);
    }
  });

  it("say what was wrong, and quote a long input only in part", () => {
    const r = revisionParams.safeParse({ schemeId: "x".repeat(10_000), version: "7" });
    expect(r.success).toBe(false);
    const message = r.error!.issues[0]!.message;
    expect(message).toMatch(/is not the id of any scheme/);
    expect(message.length).toBeLessThan(100);
  });
});

describe("ids", () => {
  it("are UUIDs, in either case", () => {
    const id = idParam("project");
    expect(id.safeParse("0f8fad5b-d9cb-469f-a165-70867728950e").success).toBe(true);
    expect(id.safeParse("0F8FAD5B-D9CB-469F-A165-70867728950E").success).toBe(true);
    for (const raw of ["0f8fad5bd9cb469fa16570867728950e", "{0f8fad5b-d9cb-469f-a165-70867728950e}", "0f8fad5b-d9cb-469f-a165-70867728950e ", "0f8fad5b-d9cb-469f-a165-70867728950g"]) {
      expect(id.safeParse(raw).success, raw).toBe(false);
    }
  });
});

describe("the return path after sign-in", () => {
  it("keeps paths on this site, with their query", () => {
    expect(safeReturnPath("/projects/abc?tab=schemes#top")).toBe("/projects/abc?tab=schemes#top");
    expect(safeReturnPath("/")).toBe("/");
  });

  it("turns every way out to another site into /", () => {
    for (const raw of ["//evil.example", "/\\evil.example", "/\\/evil.example", "https://evil.example", "javascript:alert(1)", "evil", "", undefined, `/${"a".repeat(3000)}`]) {
      expect(safeReturnPath(raw), String(raw)).toBe("/");
    }
  });
});
