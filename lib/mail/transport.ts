import "server-only";

import nodemailer, { type Transporter } from "nodemailer";

import { env } from "@/lib/env";

const g = globalThis as unknown as { __gradelineMailer?: Transporter };

export function mailer(): Transporter {
  if (!g.__gradelineMailer) {
    const e = env();
    g.__gradelineMailer = nodemailer.createTransport({
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE,
      auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASS ?? "" } : undefined,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
      socketTimeout: 10_000,
      // The local catcher speaks plain SMTP; real servers negotiate STARTTLS.
      ignoreTLS: e.SMTP_HOST === "127.0.0.1" && !e.SMTP_SECURE,
    });
  }
  return g.__gradelineMailer;
}

export async function pingMail(): Promise<void> {
  await mailer().verify();
}
