import "server-only";

import { claimDueMail, markMailFailed, markMailSent } from "@/db/queries/outbox";
import { env } from "@/lib/env";

import { mailer } from "./transport";

const MAX_ATTEMPTS = 12;

/** Sends what is due in the outbox; a mail failure never fails the action that queued it. */
export async function processOutbox(): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  for (const mail of await claimDueMail()) {
    try {
      await mailer().sendMail({
        from: env().MAIL_FROM,
        to: mail.toAddress,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        messageId: `<${mail.id}@gradeline.mail>`,
        attachments: mail.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content })),
      });
      await markMailSent(mail.id);
      sent++;
    } catch (error) {
      await markMailFailed(mail.id, error instanceof Error ? error.message : String(error), mail.attempts >= MAX_ATTEMPTS);
      failed++;
    }
  }
  return { sent, failed };
}

export function startOutboxWorker(intervalMs = 1_000): () => void {
  let running = false;
  const timer = setInterval(async () => {
    if (running) return;
    running = true;
    try {
      await processOutbox();
    } catch (error) {
      console.error("[mail] outbox run failed", error);
    } finally {
      running = false;
    }
  }, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
