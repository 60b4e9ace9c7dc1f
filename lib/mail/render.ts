import { appUrl } from "@/lib/env";

export type MailContent = {
  heading: string;
  paragraphs: string[];
  action?: { label: string; path: string };
  /** Label-value rows (addresses, times, amounts): shown as a small table. */
  facts?: [string, string][];
};

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c);

/** Plain-text and HTML parts of a message in Gradeline's voice. */
export function renderMail(content: MailContent): { text: string; html: string } {
  const url = content.action ? `${appUrl()}${content.action.path}` : null;
  const text = [
    content.heading,
    "",
    ...content.paragraphs.flatMap((p) => [p, ""]),
    ...(content.facts ?? []).map(([k, v]) => `${k}: ${v}`),
    ...(content.facts?.length ? [""] : []),
    ...(url && content.action ? [`${content.action.label}: ${url}`, ""] : []),
    "— Gradeline, sewer scopes before you buy",
  ].join("\n");
  const facts = content.facts?.length
    ? `<table style="border-collapse:collapse;margin:16px 0">${content.facts
        .map(([k, v]) => `<tr><td style="padding:4px 16px 4px 0;color:#4a5560">${escape(k)}</td><td style="padding:4px 0;font-family:monospace">${escape(v)}</td></tr>`)
        .join("")}</table>`
    : "";
  const button = url && content.action ? `<p style="margin:24px 0"><a href="${escape(url)}" style="background:#0f5c5c;color:#ffffff;padding:10px 18px;border-radius:6px;text-decoration:none">${escape(content.action.label)}</a></p>` : "";
  const html = `<!doctype html><html><body style="margin:0;background:#f7f5ef;color:#1d252c;font-family:Georgia,serif">
<div style="max-width:560px;margin:0 auto;padding:32px 24px">
<p style="font-family:Arial,sans-serif;font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#0f5c5c">Gradeline</p>
<h1 style="font-size:22px;font-weight:normal">${escape(content.heading)}</h1>
${content.paragraphs.map((p) => `<p style="font-family:Arial,sans-serif;font-size:15px;line-height:1.5">${escape(p)}</p>`).join("\n")}
${facts}${button}
<p style="font-family:Arial,sans-serif;font-size:12px;color:#4a5560;border-top:1px solid #ddd8cc;padding-top:12px">Gradeline · sewer scopes before you buy</p>
</div></body></html>`;
  return { text, html };
}
