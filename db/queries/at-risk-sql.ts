import { and, inArray, isNull, or, sql, type SQL } from "drizzle-orm";

import { NO_APPOINTMENT_BEFORE_DEADLINE_HOURS, NO_INSPECTOR_AFTER_HOURS } from "@/lib/orders/at-risk";

import { orders } from "../schema";

/** The SQL twin of atRiskReasons() in lib/orders/at-risk.ts (a test keeps the two in step). */
export function atRiskCondition(): SQL {
  return and(
    inArray(orders.status, ["open", "accepted", "scheduled"]),
    or(
      and(isNull(orders.inspectorId), sql`${orders.createdAt} <= now() - make_interval(hours => ${NO_INSPECTOR_AFTER_HOURS})`),
      sql`${orders.appointmentEnd} > ${orders.deadline}`,
      and(isNull(orders.appointmentEnd), sql`${orders.deadline} <= now() + make_interval(hours => ${NO_APPOINTMENT_BEFORE_DEADLINE_HOURS})`),
    ),
  )!;
}
