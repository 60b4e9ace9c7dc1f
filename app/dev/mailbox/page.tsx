import path from "node:path";

import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { env } from "@/lib/env";
import { formatDateTime } from "@/lib/format";
import { readCaughtMail } from "@/services/mail-catcher";

export const metadata: Metadata = { title: "Mailbox (development)" };
export const dynamic = "force-dynamic";

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/;

/** The message text with its addresses made into links, so a developer can follow an invitation. */
function Linked({ text }: { text: string }) {
  return text.split(URL_PATTERN).map((part, i) =>
    i % 2 === 1 ? (
      <a key={i} href={part} className="text-teal underline underline-offset-2">
        {part}
      </a>
    ) : (
      part
    ),
  );
}

/** Development only: every e-mail the local SMTP catcher received. */
export default async function MailboxPage() {
  const e = env();
  if (!e.MAILBOX_ENABLED) notFound();
  const messages = readCaughtMail(path.join(e.DATA_DIR, "mail")).slice(0, 200);
  return (
    <main id="main" className="mx-auto max-w-4xl px-4 py-10">
      <PageHeader
        eyebrow="Development"
        title="Mailbox"
        description="Every e-mail Gradeline sent, as the local mail catcher received it. This page does not exist in production."
        back={{ href: "/home", label: "Back to the app" }}
      />
      {messages.length === 0 ? (
        <EmptyState title="No mail yet" description="Messages appear here a second or two after the app sends them." />
      ) : (
        <ol className="space-y-3">
          {messages.map((m) => (
            <li key={m.id} className="rounded-card border border-rule bg-white">
              <details>
                <summary className="flex cursor-pointer flex-wrap items-baseline justify-between gap-2 px-4 py-3">
                  <span className="font-medium">{m.subject}</span>
                  <span className="text-sm text-ink-2">
                    to {m.to.join(", ")} · <span className="num">{formatDateTime(m.receivedAt, "America/Los_Angeles")}</span>
                    {m.attachments.length ? ` · ${m.attachments.map((a) => a.filename).join(", ")}` : ""}
                  </span>
                </summary>
                <pre className="overflow-x-auto border-t border-rule px-4 py-3 font-mono text-sm whitespace-pre-wrap">
                  <Linked text={m.text} />
                </pre>
              </details>
            </li>
          ))}
        </ol>
      )}
    </main>
  );
}
