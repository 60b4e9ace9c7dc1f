import "server-only";

import type { Tx } from "@/db/client";
import { enqueueMail } from "@/db/queries/outbox";
import { formatDateTime } from "@/lib/format";
import { renderMail, type MailContent } from "@/lib/mail/render";
import { formatMoney } from "@/lib/money";

import { visitCalendarFile } from "./ics";

export type MailOrder = { id: string; address: string; timeZone: string; deadline: Date; priceCents: number };
type Person = { email: string; name: string };

function send(tx: Tx, key: string, to: Person, subject: string, content: MailContent, attachments?: { filename: string; contentType: string; content: string }[]) {
  return enqueueMail({ key, to: to.email, subject, ...renderMail(content), attachments }, tx);
}

const when = (o: MailOrder, d: Date) => formatDateTime(d, o.timeZone);

export const orderMail = {
  placed: (tx: Tx, o: MailOrder, agent: Person) =>
    send(tx, `order:${o.id}:placed`, agent, `Scope ordered: ${o.address}`, {
      heading: "Your sewer scope is ordered",
      paragraphs: [`We have posted ${o.address} to the job board of every verified inspector who serves that postal code. You will hear from us the moment one takes it.`],
      facts: [
        ["Contingency deadline", when(o, o.deadline)],
        ["Price", formatMoney(o.priceCents)],
      ],
      action: { label: "Follow the order", path: `/orders/${o.id}` },
    }),

  taken: (tx: Tx, o: MailOrder, agent: Person, inspector: { name: string; company: string | null }, eventId: string) =>
    send(tx, `order:${o.id}:taken:${eventId}`, agent, `An inspector took ${o.address}`, {
      heading: `${inspector.name} took the job`,
      paragraphs: [`${inspector.name}${inspector.company ? ` of ${inspector.company}` : ""} will propose visit times inside your windows, before the deadline.`],
      facts: [["Contingency deadline", when(o, o.deadline)]],
      action: { label: "Open the order", path: `/orders/${o.id}` },
    }),

  proposed: (tx: Tx, o: MailOrder, proposalKey: string, people: { agent: Person; inspector: Person; buyer: Person }, slots: { start: Date; end: Date }[]) => {
    const facts: [string, string][] = slots.map((s, i) => [`Option ${i + 1}`, `${when(o, s.start)} – ${formatDateTime(s.end, o.timeZone).split(", ").pop()}`]);
    return Promise.all([
      send(tx, `${proposalKey}:agent`, people.agent, `Visit times proposed for ${o.address}`, {
        heading: "Pick a time for the sewer scope",
        paragraphs: [`${people.inspector.name} proposed ${slots.length === 1 ? "a visit time" : `${slots.length} visit times`}. Confirm one so the visit is booked.`],
        facts,
        action: { label: "Confirm a time", path: `/orders/${o.id}` },
      }),
      send(tx, `${proposalKey}:inspector`, people.inspector, `You proposed times for ${o.address}`, {
        heading: "Times sent to the agent",
        paragraphs: ["We will tell you as soon as the agent confirms one."],
        facts,
        action: { label: "Open the job", path: `/jobs/${o.id}` },
      }),
      send(tx, `${proposalKey}:buyer`, people.buyer, `Sewer scope times proposed for ${o.address}`, {
        heading: "The sewer scope of your future home is being scheduled",
        paragraphs: [`Your agent ordered a camera inspection of the sewer line at ${o.address}. The inspector proposed these times; your agent confirms one.`],
        facts,
      }),
    ]);
  },

  confirmed: (tx: Tx, o: MailOrder, people: { agent: Person; inspector: Person; buyer: Person }, visit: { start: Date; end: Date }, url: string) => {
    const ics = visitCalendarFile({ orderId: o.id, start: visit.start, end: visit.end, address: o.address, inspectorName: people.inspector.name, url });
    const attachment = [{ filename: "sewer-scope-visit.ics", contentType: "text/calendar; method=PUBLISH", content: ics }];
    const facts: [string, string][] = [
      ["Visit", when(o, visit.start)],
      ["Address", o.address],
      ["Inspector", people.inspector.name],
    ];
    const key = `order:${o.id}:confirmed:${visit.start.toISOString()}`;
    return Promise.all([
      send(tx, `${key}:agent`, people.agent, `Visit booked: ${o.address}`, { heading: "The sewer scope is booked", paragraphs: ["The calendar file is attached."], facts, action: { label: "Open the order", path: `/orders/${o.id}` } }, attachment),
      send(tx, `${key}:inspector`, people.inspector, `Visit confirmed: ${o.address}`, { heading: "Your visit is confirmed", paragraphs: ["The calendar file is attached. Access notes are on the job page."], facts, action: { label: "Open the job", path: `/jobs/${o.id}` } }, attachment),
      send(tx, `${key}:buyer`, people.buyer, `Sewer scope booked for ${o.address}`, { heading: "The sewer scope is booked", paragraphs: ["You do not need to be there. When the report is ready we will send you a link to it."], facts }, attachment),
    ]);
  },

  released: (tx: Tx, o: MailOrder, agent: Person, inspectorName: string, reason: string, eventId: string) =>
    send(tx, `order:${o.id}:released:${eventId}`, agent, `The inspector released ${o.address}`, {
      heading: "The job is back on the job board",
      paragraphs: [`${inspectorName} released the job: "${reason}". It is open again for every verified inspector in the area.`],
      facts: [["Contingency deadline", when(o, o.deadline)]],
      action: { label: "Open the order", path: `/orders/${o.id}` },
    }),

  cancelled: (tx: Tx, o: MailOrder, inspector: Person, reason: string) =>
    send(tx, `order:${o.id}:cancelled:inspector`, inspector, `Cancelled: ${o.address}`, {
      heading: "The agent cancelled this scope",
      paragraphs: [`Reason given: "${reason}". Nothing more is needed from you.`],
    }),

  atRisk: (tx: Tx, o: MailOrder, to: Person, reasons: string[], path: string) =>
    send(tx, `order:${o.id}:at-risk:${to.email}`, to, `At risk: ${o.address} may miss its deadline`, {
      heading: "This sewer scope may miss the contingency deadline",
      paragraphs: [...reasons, "Consider asking for an extension of the inspection contingency now, while there is time."],
      facts: [["Contingency deadline", when(o, o.deadline)]],
      action: { label: "Open the order", path },
    }),
};
