import fs from "node:fs";
import path from "node:path";

import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export type CaughtMail = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  messageId: string | null;
  attachments: { filename: string; contentType: string; size: number }[];
};

/** A local SMTP catcher for development and tests: every message lands as a JSON file in `dir`. */
export async function startMailCatcher(opts: { port: number; host?: string; dir: string }) {
  fs.mkdirSync(opts.dir, { recursive: true });
  let seq = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    banner: "Gradeline local mail catcher",
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const id = `${Date.now().toString().padStart(15, "0")}-${process.pid}-${seq++}`;
          const toField = Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : [];
          const record: CaughtMail = {
            id,
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? "",
            to: toField.flatMap((a) => a.value.map((v) => v.address ?? "")),
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : "",
            messageId: mail.messageId ?? null,
            attachments: mail.attachments.map((a) => ({ filename: a.filename ?? "attachment", contentType: a.contentType, size: a.size })),
          };
          fs.writeFileSync(path.join(opts.dir, `${id}.json`), JSON.stringify(record));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, opts.host ?? "127.0.0.1", () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === "object" && address ? address.port : opts.port;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

export function readCaughtMail(dir: string): CaughtMail[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .reverse()
    .map((f) => JSON.parse(fs.readFileSync(path.join(dir, f), "utf8")) as CaughtMail);
}

export function clearCaughtMail(dir: string): void {
  if (!fs.existsSync(dir)) return;
  for (const f of fs.readdirSync(dir)) if (f.endsWith(".json")) fs.rmSync(path.join(dir, f));
}
