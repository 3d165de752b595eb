import { describe, expect, it } from "vitest";
import { SECRET_MIN_LENGTH, secretProblems } from "@/lib/env";

describe("secretProblems", () => {
  it("names a missing, published or short secret, and passes a long random one", () => {
    expect(secretProblems(undefined)[0]).toMatch(/NEXTAUTH_SECRET is not set/);
    expect(secretProblems("stopwright-local-development-secret")[0]).toMatch(/published/);
    expect(secretProblems("x".repeat(SECRET_MIN_LENGTH - 1))[0]).toMatch(/only 31 characters long \(at least 32\)/);
    expect(secretProblems("0123456789abcdef0123456789abcdef")).toEqual([]);
  });
});
