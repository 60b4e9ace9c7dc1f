import { invalid } from "./errors";
import type { StandinState } from "./state";

type Obj = Record<string, unknown> & { object?: unknown };

const EXPANDABLE: Record<string, readonly string[]> = {
  "checkout.session": ["payment_intent", "line_items"],
  payment_intent: ["latest_charge"],
  charge: ["payment_intent"],
  refund: ["charge", "payment_intent"],
  transfer: ["destination", "source_transaction"],
  transfer_reversal: ["transfer"],
};

function lookup(state: StandinState, id: string): unknown {
  if (id.startsWith("cs_")) return state.checkout_sessions[id];
  if (id.startsWith("pi_")) return state.payment_intents[id];
  if (id.startsWith("ch_")) return state.charges[id];
  if (id.startsWith("re_")) return state.refunds[id];
  if (id.startsWith("acct_")) return state.accounts[id];
  if (id.startsWith("tr_")) return state.transfers[id];
  return undefined;
}

/** Applies `expand[]` paths such as `payment_intent.latest_charge` to a copy of the object. */
export function expand<T>(state: StandinState, object: T, paths: string[]): T {
  if (paths.length === 0) return object;
  const root = structuredClone(object) as Obj;
  for (const path of paths) {
    let current: Obj = root;
    for (const key of path.split(".")) {
      const allowed = EXPANDABLE[String(current.object)] ?? [];
      if (!allowed.includes(key)) throw invalid(`This property cannot be expanded (${key}).`, "expand");
      if (key === "line_items" && current.object === "checkout.session") {
        const id = String(current.id);
        current.line_items = {
          object: "list",
          data: state.line_items[id] ?? [],
          has_more: false,
          url: `/v1/checkout/sessions/${id}/line_items`,
        };
        break;
      }
      const value = current[key];
      if (typeof value === "string") {
        const found = lookup(state, value);
        if (found) current[key] = structuredClone(found);
      }
      const next = current[key];
      if (typeof next !== "object" || next === null) break;
      current = next as Obj;
    }
  }
  return root as T;
}
