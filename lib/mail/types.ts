/** What the Outgoing mail page shows of a message: pure, shared by the server and the browser. */
export type OutboxAttachment = { id: string; filename: string; contentType: string; sizeBytes: number };
export type OutboxMessage = {
  id: string;
  kind: string;
  to: string[];
  subject: string;
  text: string;
  links: { label: string; url: string }[];
  status: "queued" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  createdAt: string;
  lastAttemptAt: string | null;
  sentAt: string | null;
  attachments: OutboxAttachment[];
};
