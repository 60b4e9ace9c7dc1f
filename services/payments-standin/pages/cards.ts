import type { CardDetails, PaymentError } from "../types";

export interface CardInput {
  card_number: string;
  exp: string;
  cvc: string;
}

export type CardField = keyof CardInput;
export type FieldErrors = Partial<Record<CardField, string>>;

export type CardCheck = { ok: false; errors: FieldErrors } | { ok: true; card: CardDetails; decline: PaymentError | null };

const DECLINED = { code: "card_declined", decline_code: "generic_decline", message: "Your card was declined." };

const TEST_CARDS: Record<string, { brand: string; decline?: Omit<PaymentError, "type"> }> = {
  "4242424242424242": { brand: "visa" },
  "5555555555554444": { brand: "mastercard" },
  "4000000000000002": { brand: "visa", decline: DECLINED },
  "4000000000009995": {
    brand: "visa",
    decline: { code: "card_declined", decline_code: "insufficient_funds", message: "Your card has insufficient funds." },
  },
  "4000000000000069": { brand: "visa", decline: { code: "expired_card", decline_code: null, message: "Your card has expired." } },
  "4000000000000127": {
    brand: "visa",
    decline: { code: "incorrect_cvc", decline_code: null, message: "Your card's security code is incorrect." },
  },
};

function luhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) d = d * 2 > 9 ? d * 2 - 9 : d * 2;
    sum += d;
  }
  return sum % 10 === 0;
}

function parseExpiry(raw: string, now: Date): { month: number; year: number } | string {
  const m = /^(\d{1,2})\s*\/?\s*(\d{2}|\d{4})$/.exec(raw.trim());
  if (!m) return "Your card's expiration date is incomplete.";
  const month = Number(m[1]);
  const year = (m[2] as string).length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  if (month < 1 || month > 12) return "Your card's expiration month is invalid.";
  const thisMonth = now.getUTCFullYear() * 12 + now.getUTCMonth();
  if (year * 12 + (month - 1) < thisMonth) return "Your card's expiration date is in the past.";
  return { month, year };
}

/** Validates the hosted form's fields and looks the number up among the stand-in's test cards. */
export function checkCard(input: CardInput, now: Date): CardCheck {
  const errors: FieldErrors = {};
  const digits = input.card_number.replace(/[\s-]/g, "");
  if (!/^\d+$/.test(digits) || digits.length < 13) errors.card_number = "Your card number is incomplete.";
  else if (digits.length > 19 || !luhn(digits)) errors.card_number = "Your card number is invalid.";
  const expiry = parseExpiry(input.exp, now);
  if (typeof expiry === "string") errors.exp = expiry;
  if (!/^\d{3,4}$/.test(input.cvc.trim())) errors.cvc = "Your card's security code is incomplete.";
  if (Object.keys(errors).length > 0 || typeof expiry === "string") return { ok: false, errors };

  const known = TEST_CARDS[digits];
  const card: CardDetails = {
    brand: known?.brand ?? "unknown",
    country: "US",
    exp_month: expiry.month,
    exp_year: expiry.year,
    funding: "credit",
    last4: digits.slice(-4),
  };
  if (known && !known.decline) return { ok: true, card, decline: null };
  const decline = known?.decline ?? {
    ...DECLINED,
    decline_code: "test_mode_live_card",
    message: "Your card was declined. The local payment stand-in accepts its test cards only.",
  };
  return { ok: true, card, decline: { type: "card_error", ...decline } };
}
