/**
 * Stopwright's one way to send e-mail (server only). Callers build their words with composeMail and
 * hand them to queueMail; the mail worker (started per server process from instrumentation.ts) sends
 * them over SMTP with retries. See "Outgoing mail" in DEVELOPERS.md.
 */
import "server-only";
export { composeMail, type MailLink, type MailParts } from "./compose";
export { queueMail, type MailAttachment, type MailMessage } from "./queue";
