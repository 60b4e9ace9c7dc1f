import type { OrderStatus } from "@/db/schema";

import type { AtRiskReason } from "./at-risk";

/** What order answers carry (agent and admin view). Field names match POST /api/orders. */
export type OrderDto = {
  id: string;
  status: OrderStatus;
  address: { street: string; unit: string | null; city: string; state: string; postalCode: string };
  listingRef: string | null;
  propertyType: string;
  yearBuilt: number | null;
  occupancy: string;
  accessNotes: string;
  cleanoutKnown: boolean;
  cleanoutNote: string | null;
  buildingSewers: number;
  deadline: string;
  timeZone: string;
  visitWindows: { start: string; end: string }[];
  anyTimeInWindows: boolean;
  buyer: { name: string; email: string; invitation: "waiting_for_report" | "invited" | "joined" };
  notes: string | null;
  priceCents: number;
  priceLines: { label: string; cents: number }[];
  inspectorPayoutCents: number;
  inspector: { id: string; name: string; company: string | null; licenceNumber: string | null } | null;
  appointment: { start: string; end: string } | null;
  atRisk: { flagged: boolean; reasons: AtRiskReason[]; text: string[] };
  createdAt: string;
};

/** What an inspector sees of a job: no buyer contact details. */
export type JobDto = Omit<OrderDto, "buyer" | "notes" | "priceCents" | "priceLines"> & {
  addOns: string[];
  buyerName: string;
  notes: string | null;
};

export type OrderEventDto = { id: string; from: OrderStatus | null; to: OrderStatus; at: string; by: { name: string; role: string } | null; reason: string | null };

export type ProposalDto = { id: string; start: string; end: string; status: "proposed" | "confirmed" | "declined" | "withdrawn" };

export type OrderDetailDto = { order: OrderDto; events: OrderEventDto[]; proposals: ProposalDto[] };

/** One row of an orders table: what the list shows, without the order's access details and price lines. */
export type OrderSummaryDto = Pick<OrderDto, "id" | "status" | "address" | "listingRef" | "deadline" | "timeZone" | "priceCents" | "appointment" | "atRisk" | "createdAt"> & {
  inspector: { id: string; name: string } | null;
  buyerName: string;
};

export type OrderListDto = { orders: OrderSummaryDto[]; total: number; page: number; pageSize: number };
