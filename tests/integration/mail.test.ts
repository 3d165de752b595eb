// The one mail set-up: every message goes through the app's outbox, the queue's worker delivers it to
// the SMTP server named in the settings (here the local stand-in), a server that is down is logged and
// retried, and the administrator reads the outbox — texts, links and attachments — on Outgoing mail.
import { randomUUID } from "node:crypto";
import nodemailer from "nodemailer";
import { afterAll, describe, expect, it, vi } from "vitest";
import { waitForMail } from "../support/mail";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb } from "../support/server";

vi.mock("server-only", () => ({}));

afterAll(async () => {
  await closeTestDb();
  const { pool } = await import("@/db/client");
  await pool.end();
});

const uid = () => randomUUID().slice(0, 8);

async function outboxRow(status: "queued" | "failed", subject: string, to: string) {
  const { rows } = await testDb().query(
    "insert into outgoing_mail (kind, \"to\", subject, text, links, status) values ('test', $1, $2, $3, $4, $5) returning id",
    [[to], subject, `Body of ${subject}\n\nhttps://example.invalid/a-link`, JSON.stringify([{ label: "A link", url: "https://example.invalid/a-link" }]), status],
  );
  return rows[0].id as string;
}

async function waitForStatus(id: string, status: string) {
  for (let i = 0; i < 80; i++) {
    const { rows } = await testDb().query("select status from outgoing_mail where id = $1", [id]);
    if (rows[0]?.status === status) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`message ${id} never became ${status}`);
}

describe("outgoing mail", () => {
  it("is kept in the outbox, sent, and listed for the administrator with its links; no other role reads it", async () => {
    const designer = await signIn(await makeUser("designer"));
    const project = (await api("/api/projects", { method: "POST", cookie: designer, body: { name: `Mail ${uid()}`, clientName: "Invented" } })).json.project;
    const email = `mail-${uid()}@parish.example`;
    expect((await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie: designer, body: { email, name: "Mail Person" } })).status).toBe(200);
    const received = await waitForMail((m) => m.envelopeTo.includes(email));
    expect(received.mailId).toMatch(/^[0-9a-f-]{36}$/);
    await waitForStatus(received.mailId!, "sent");

    const admin = await signIn(await makeUser("admin"));
    const listed = (await api("/api/admin/mail", { cookie: admin })).json.messages.find((m: { id: string }) => m.id === received.mailId);
    expect(listed).toMatchObject({ kind: "invitation", to: [email], status: "sent", attempts: 1, lastError: null });
    expect(listed.links[0].url).toBe(received.links.find((l) => l.includes("/invite/")));
    expect(listed.text).toBe(received.text.trim());
    const page = await (await fetch(`${baseUrl}/admin/mail`, { headers: { cookie: admin } })).text();
    expect(page).toContain(listed.subject.replace(/'/g, "&#x27;"));
    expect((await api("/api/admin/mail", { cookie: designer })).status).toBe(403);
    expect((await fetch(`${baseUrl}/admin/mail`, { headers: { cookie: designer }, redirect: "manual" })).status).not.toBe(200);
  });

  it("whose server is down is logged, kept queued for the next try, and marked failed after the last", async () => {
    const { deliverMail } = await import("@/lib/mail/deliver");
    const down = nodemailer.createTransport({ host: "127.0.0.1", port: 9, ignoreTLS: true, connectionTimeout: 2000 });
    const id = await outboxRow("queued", `Down ${uid()}`, "someone@parish.example");
    const warn = vi.spyOn(console, "warn").mockImplementation(() => {});
    await expect(deliverMail({ mailId: id, attempt: 1, last: false }, down)).rejects.toThrow();
    let row = (await testDb().query("select status, attempts, last_error from outgoing_mail where id = $1", [id])).rows[0];
    expect(row).toMatchObject({ status: "queued", attempts: 1 });
    expect(row.last_error).toMatch(/ECONNREFUSED|connect/i);
    expect(warn.mock.calls[0]?.join(" ")).toMatch(/try 1 failed .* will retry/);
    await expect(deliverMail({ mailId: id, attempt: 2, last: true }, down)).rejects.toThrow();
    row = (await testDb().query("select status, attempts from outgoing_mail where id = $1", [id])).rows[0];
    expect(row).toMatchObject({ status: "failed", attempts: 2 });
    expect(warn.mock.calls[1]?.join(" ")).toContain("marked failed");
    warn.mockRestore();
  });

  it("sends a failed message again on the administrator's word, attachments and all, which the administrator can download", async () => {
    const to = `attach-${uid()}@parish.example`;
    const id = await outboxRow("failed", `Attached ${uid()}`, to);
    const bytes = Buffer.from([0x25, 0x50, 0x44, 0x46, 0x2d, 0x00, 0xff, 0x10]);
    const { rows } = await testDb().query(
      "insert into outgoing_mail_attachments (mail_id, filename, content_type, content, size_bytes) values ($1, 'Tender — St Test.pdf', 'application/pdf', $2, $3) returning id",
      [id, bytes, bytes.length],
    );
    const admin = await signIn(await makeUser("admin"));
    expect((await api(`/api/admin/mail/${id}/resend`, { method: "POST", cookie: admin })).status).toBe(200);
    const received = await waitForMail((m) => m.envelopeTo.includes(to));
    expect(received.attachments).toEqual([expect.objectContaining({ filename: "Tender — St Test.pdf", contentType: "application/pdf" })]);
    expect(Buffer.compare(received.attachments[0]!.content, bytes)).toBe(0);
    await waitForStatus(id, "sent");
    expect((await api(`/api/admin/mail/${id}/resend`, { method: "POST", cookie: admin })).status).toBe(409);

    const file = await fetch(`${baseUrl}/api/admin/mail/${id}/attachments/${rows[0].id}`, { headers: { cookie: admin } });
    expect(file.status).toBe(200);
    expect(file.headers.get("content-type")).toBe("application/pdf");
    expect(Buffer.compare(Buffer.from(await file.arrayBuffer()), bytes)).toBe(0);
    const designer = await signIn(await makeUser("designer"));
    expect((await fetch(`${baseUrl}/api/admin/mail/${id}/attachments/${rows[0].id}`, { headers: { cookie: designer } })).status).toBe(403);
  });
});
