import { formatAmount } from "../core/money";
import type { CheckoutSession, LineItem } from "../types";
import type { CardField, CardInput, FieldErrors } from "./cards";
import { esc, page } from "./html";

export interface PayPageProps {
  session: CheckoutSession;
  items: LineItem[];
  values?: Partial<CardInput> & { email?: string };
  errors?: FieldErrors & { email?: string };
  /** A payment-level failure such as a decline, announced at the top of the form. */
  formError?: string;
}

type FieldName = CardField | "email";
const FIELD_ORDER: FieldName[] = ["email", "card_number", "exp", "cvc"];

/** After a failed submit, focus lands on the field to fix, so its error is read out with it. */
function focusTarget(props: PayPageProps): FieldName | undefined {
  if (props.formError) return "card_number";
  return FIELD_ORDER.find((name) => props.errors?.[name]);
}

function field(name: FieldName, label: string, props: PayPageProps, attrs: string, hint?: string): string {
  const error = props.errors?.[name];
  const focus = focusTarget(props) === name ? " autofocus" : "";
  const value = name === "cvc" ? "" : (props.values?.[name] ?? "");
  const describedBy = [hint ? `${name}-hint` : "", error ? `${name}-error` : "", props.formError ? "form-error" : ""]
    .filter(Boolean)
    .join(" ");
  return `<div class="field">
<label for="${name}">${esc(label)}</label>
<input id="${name}" name="${name}" value="${esc(value)}" ${attrs}${focus}${error ? ' aria-invalid="true"' : ""}${describedBy ? ` aria-describedby="${describedBy}"` : ""}>
${hint ? `<p class="hint" id="${name}-hint">${esc(hint)}</p>` : ""}
${error ? `<p class="field-error" id="${name}-error">${esc(error)}</p>` : ""}
</div>`;
}

export function renderPayPage(props: PayPageProps): string {
  const { session, items } = props;
  const total = formatAmount(session.amount_total, session.currency);
  const lines = items
    .map(
      (i) =>
        `<li><span>${esc(i.description)}${i.quantity > 1 ? ` × ${i.quantity}` : ""}</span><span>${esc(formatAmount(i.amount_total, i.currency))}</span></li>`,
    )
    .join("");
  const errorCount = Object.keys(props.errors ?? {}).length;
  const alert = props.formError
    ? `<div class="alert" id="form-error" role="alert">${esc(props.formError)}</div>`
    : errorCount > 0
      ? `<div class="alert" role="alert">Check the highlighted field${errorCount > 1 ? "s" : ""}.</div>`
      : "";
  const email = session.customer_email
    ? `<p class="muted">Receipt to <strong>${esc(session.customer_email)}</strong></p>`
    : field("email", "Email (optional)", props, 'type="email" autocomplete="email"');
  const cancel = session.cancel_url
    ? `<button class="secondary" type="submit" name="action" value="cancel" formnovalidate>Cancel</button>`
    : "";
  return page(
    `Pay ${total}`,
    `<div class="panel">
<h1>Pay ${esc(total)}</h1>
<section aria-labelledby="summary-heading">
<h2 id="summary-heading">Order summary</h2>
<ul class="items">${lines}</ul>
<p class="total"><span>Total</span><span>${esc(total)}</span></p>
</section>
<form method="post" action="/pay/${esc(session.id)}" novalidate aria-labelledby="card-heading">
<h2 id="card-heading">Payment details</h2>
${alert}
${email}
${field("card_number", "Card number", props, 'inputmode="numeric" autocomplete="cc-number" placeholder="1234 1234 1234 1234" required', "Test cards: 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is declined. Any future expiry and any CVC.")}
<div class="row">
${field("exp", "Expiry (MM / YY)", props, 'inputmode="numeric" autocomplete="cc-exp" placeholder="MM / YY" required')}
${field("cvc", "CVC", props, 'inputmode="numeric" autocomplete="cc-csc" placeholder="123" required')}
</div>
<div class="actions">
<button class="primary" type="submit" name="action" value="pay">Pay ${esc(total)}</button>
${cancel}
</div>
</form>
</div>`,
  );
}
