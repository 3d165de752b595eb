// Invitation link secrets: 256 random bits, URL-safe; only their SHA-256 is stored (invitations.token_hash).
// Shared by the server (db/queries/committee.ts) and the demo seed.
import { createHash, randomBytes } from "node:crypto";

export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}
