// A local stand-in for the firm's SMTP server, for the demo and the tests only: it listens on
// 127.0.0.1, accepts every message, and keeps each one as a .eml file (with a .json of its envelope)
// in a folder. The app does not know it is a fake: it reaches it through its SMTP settings.
//   node scripts/fake-smtp.mjs PORT FOLDER
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { SMTPServer } from "smtp-server";

const port = Number(process.argv[2] ?? 2525);
const dir = process.argv[3] ?? ".data/mail";
mkdirSync(dir, { recursive: true });
let n = 0;

const server = new SMTPServer({
  // smtp-server's built-in certificate has expired, so STARTTLS is off; the app connects with SMTP_SECURITY=none.
  disabledCommands: ["STARTTLS"],
  authOptional: true,
  logger: false,
  banner: "local mail stand-in",
  onData(stream, session, callback) {
    const chunks = [];
    stream.on("data", (c) => chunks.push(c));
    stream.on("end", () => {
      const name = `${Date.now()}-${process.pid}-${String(++n).padStart(4, "0")}`;
      const envelope = { from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null, to: session.envelope.rcptTo.map((r) => r.address), receivedAt: new Date().toISOString() };
      // The envelope first, then the message: a reader that sees the .eml also finds its envelope.
      writeFileSync(join(dir, `${name}.json`), JSON.stringify(envelope));
      writeFileSync(join(dir, `${name}.eml`), Buffer.concat(chunks));
      callback();
    });
  },
});

server.on("error", (err) => console.error(`fake SMTP: ${err.message}`));
server.listen(port, "127.0.0.1", () => console.log(`fake SMTP listening on 127.0.0.1:${port}, keeping mail in ${dir}`));
const stop = () => server.close(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
