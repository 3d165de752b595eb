/**
 * Plain text and HTML of one message from the same parts, so both say the same thing. Pure: the
 * callers (invitations, notifications, tender documents) build their words here and queue them with
 * queueMail.
 */
export type MailLink = { label: string; url: string };

export type MailParts = {
  /** "Dear Ada Example," — left out when empty. */
  greeting?: string;
  paragraphs: readonly string[];
  /** Shown as buttons in HTML and as "label: url" lines in text; also listed on the Outgoing mail page. */
  links?: readonly MailLink[];
  /** Small print at the end, e.g. why the reader gets this message. */
  footer?: string;
  /** Who signs, e.g. the firm's name. */
  signature?: string;
};

const escapeHtml = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");

export function composeMail(parts: MailParts): { text: string; html: string; links: MailLink[] } {
  const links = [...(parts.links ?? [])];
  const text = [
    parts.greeting,
    ...parts.paragraphs,
    ...links.map((l) => `${l.label}:\n${l.url}`),
    parts.signature,
    parts.footer ? `--\n${parts.footer}` : undefined,
  ]
    .filter((x): x is string => !!x)
    .join("\n\n");
  // Inline styles only: mail programs drop style sheets. Colours from Stopwright's palette (ink on paper, brass).
  const p = (s: string) => `<p style="margin:0 0 14px">${escapeHtml(s).replace(/\n/g, "<br>")}</p>`;
  const html = [
    `<div style="font-family:Georgia,serif;color:#1d2433;background:#f7f4ec;padding:24px;line-height:1.5;font-size:15px">`,
    parts.greeting ? p(parts.greeting) : "",
    ...parts.paragraphs.map(p),
    ...links.map(
      (l) =>
        `<p style="margin:0 0 14px"><a href="${escapeHtml(l.url)}" style="display:inline-block;background:#b0852f;color:#ffffff;padding:8px 14px;border-radius:4px;text-decoration:none;font-family:Arial,sans-serif">${escapeHtml(l.label)}</a><br><span style="font-size:12px;color:#6b737d">${escapeHtml(l.url)}</span></p>`,
    ),
    parts.signature ? p(parts.signature) : "",
    parts.footer ? `<p style="margin:18px 0 0;font-size:12px;color:#6b737d">${escapeHtml(parts.footer)}</p>` : "",
    `</div>`,
  ].join("");
  return { text, html, links };
}
