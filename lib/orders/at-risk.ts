// Gradeline's at-risk rules (product rules, not trade figures): an order is flagged to the agent
// and the admin when its appointment, or the lack of one, cannot meet the contingency deadline.

export const NO_INSPECTOR_AFTER_HOURS = 12;
export const NO_APPOINTMENT_BEFORE_DEADLINE_HOURS = 24;

const HOUR = 3_600_000;

export type AtRiskInput = {
  status: string;
  createdAt: Date;
  deadline: Date;
  inspectorId: string | null;
  appointmentEnd: Date | null;
};

export type AtRiskReason = "no_inspector" | "appointment_after_deadline" | "no_appointment";

export const AT_RISK_TEXT: Record<AtRiskReason, string> = {
  no_inspector: `No inspector has taken the job ${NO_INSPECTOR_AFTER_HOURS} hours after ordering.`,
  appointment_after_deadline: "The appointment ends after the contingency deadline.",
  no_appointment: `No appointment is set and the deadline is less than ${NO_APPOINTMENT_BEFORE_DEADLINE_HOURS} hours away.`,
};

export function atRiskReasons(o: AtRiskInput, now = new Date()): AtRiskReason[] {
  if (!["open", "accepted", "scheduled"].includes(o.status)) return [];
  const reasons: AtRiskReason[] = [];
  if (!o.inspectorId && now.getTime() - o.createdAt.getTime() >= NO_INSPECTOR_AFTER_HOURS * HOUR) reasons.push("no_inspector");
  if (o.appointmentEnd && o.appointmentEnd.getTime() > o.deadline.getTime()) reasons.push("appointment_after_deadline");
  if (!o.appointmentEnd && o.deadline.getTime() - now.getTime() <= NO_APPOINTMENT_BEFORE_DEADLINE_HOURS * HOUR) reasons.push("no_appointment");
  return reasons;
}
