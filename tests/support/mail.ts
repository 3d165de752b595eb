// What the local SMTP stand-in (scripts/fake-smtp.mjs) received: each message as a .eml with its
// envelope beside it, in TEST_MAIL_DIR. Parsed with mailparser, as a mail program would read it.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { simpleParser } from "mailparser";

export type Received = {
  envelopeTo: string[];
  subject: string;
  text: string;
  html: string;
  /** Every http(s) address in the text. */
  links: string[];
  attachments: { filename: string; contentType: string; content: Buffer }[];
  mailId: string | null;
};

const dir = () => process.env.TEST_MAIL_DIR ?? ".data/test-mail";

export async function receivedMail(): Promise<Received[]> {
  let names: string[] = [];
  try {
    names = readdirSync(dir()).filter((n) => n.endsWith(".eml")).sort();
  } catch {
    return [];
  }
  return Promise.all(
    names.map(async (name) => {
      const envelope = JSON.parse(readFileSync(join(dir(), name.replace(/\.eml$/, ".json")), "utf8")) as { to: string[] };
      const parsed = await simpleParser(readFileSync(join(dir(), name)));
      const text = parsed.text ?? "";
      return {
        envelopeTo: envelope.to,
        subject: parsed.subject ?? "",
        text,
        html: typeof parsed.html === "string" ? parsed.html : "",
        links: text.match(/https?:\/\/\S+/g) ?? [],
        attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? "", contentType: a.contentType, content: a.content })),
        mailId: (parsed.headers.get("x-stopwright-mail-id") as string | undefined) ?? null,
      };
    }),
  );
}

/** Waits (polling, up to `timeoutMs`) for the first received message that matches. */
export async function waitForMail(match: (m: Received) => boolean, timeoutMs = 20_000): Promise<Received> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await receivedMail()).find(match);
    if (found) return found;
    if (Date.now() > until) throw new Error("no such message reached the SMTP stand-in in time");
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** The invitation link of the newest invitation to `email`. */
export async function invitationLink(email: string): Promise<string> {
  const m = await waitForMail((x) => x.envelopeTo.includes(email) && x.subject.startsWith("Invitation"));
  const link = m.links.find((l) => l.includes("/invite/"));
  if (!link) throw new Error("the invitation has no link");
  return link;
}

/** Waits until at least `n` received messages match; answers all of them, oldest first. */
export async function waitForCount(match: (m: Received) => boolean, n: number, timeoutMs = 20_000): Promise<Received[]> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await receivedMail()).filter(match);
    if (found.length >= n) return found;
    if (Date.now() > until) throw new Error(`only ${found.length} of ${n} such messages reached the SMTP stand-in in time`);
    await new Promise((r) => setTimeout(r, 250));
  }
}
