// A local fake SMTP server for development and tests: accepts every message on loopback and keeps
// it as a JSON file in the mailbox folder, where the development mailbox page reads it.
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

const port = Number(process.env.SMTP_PORT ?? "3712");
const mailboxDir = process.env.PLATLOAD_MAILBOX_DIR ?? path.resolve(".data/mailbox-demo");
mkdirSync(mailboxDir, { recursive: true });

let sequence = 0;

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  size: 25 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const receivedAt = new Date();
        const id = `${receivedAt.getTime()}-${process.pid}-${sequence++}`;
        const to = session.envelope.rcptTo.map((r) => r.address);
        const account = mail.headers.get("x-platload-account");
        const message = {
          id,
          receivedAt: receivedAt.toISOString(),
          // The sending account (lib/mail/send.ts): the mailbox shows a message to that account's admins only.
          accountId: typeof account === "string" ? account : null,
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
          to,
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : "",
          attachments: mail.attachments.map((a) => ({
            filename: a.filename ?? "attachment",
            contentType: a.contentType,
            size: a.size,
            contentBase64: a.content.toString("base64"),
          })),
        };
        writeFileSync(path.join(mailboxDir, `${id}.json`), JSON.stringify(message));
        callback();
      })
      .catch((error: Error) => callback(error));
  },
});

server.on("error", (error) => console.error("mail fake:", error.message));
server.listen(port, "127.0.0.1", () => {
  console.log(`mail fake listening on 127.0.0.1:${port}, mailbox ${mailboxDir}`);
});

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => server.close(() => process.exit(0)));
}
