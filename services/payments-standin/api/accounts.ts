import { ONBOARDING_REQUIREMENTS } from "../core/accounts";
import { invalid, noSuch } from "../core/errors";
import { newId } from "../core/ids";
import type { Account, AccountLink } from "../types";
import type { ApiHandler, ApiRoute } from "./types";

const LINK_LIFETIME_SECONDS = 300;
const LINK_TYPES = ["account_onboarding", "account_update"] as const;

function mustFind(ctx: Parameters<ApiHandler>[0], id: string, param = "id"): Account {
  const account = ctx.store.state.accounts[id];
  if (!account) throw noSuch("account", id, param);
  return account;
}

const create: ApiHandler = (ctx, { params: p }) => {
  p.allowOnly(["business_type", "capabilities", "country", "default_currency", "email", "metadata", "type"]);
  const type = p.oneOf("type", ["custom", "express", "standard"] as const) ?? "express";
  const country = (p.string("country") ?? "US").toUpperCase();
  if (!/^[A-Z]{2}$/.test(country)) throw invalid(`Invalid country: ${country}`, "country");
  p.object("capabilities");
  const account: Account = {
    id: newId("acct"),
    object: "account",
    business_type: p.oneOf("business_type", ["company", "government_entity", "individual", "non_profit"]) ?? null,
    capabilities: { card_payments: "inactive", transfers: "inactive" },
    charges_enabled: false,
    country,
    created: ctx.store.now(),
    default_currency: (p.string("default_currency") ?? "usd").toLowerCase(),
    details_submitted: false,
    email: p.email("email") ?? null,
    metadata: p.metadata(),
    payouts_enabled: false,
    requirements: {
      currently_due: [...ONBOARDING_REQUIREMENTS],
      disabled_reason: "requirements.past_due",
      eventually_due: [...ONBOARDING_REQUIREMENTS],
      past_due: [...ONBOARDING_REQUIREMENTS],
    },
    type,
  };
  ctx.store.state.accounts[account.id] = account;
  return account;
};

const retrieve: ApiHandler = (ctx, { params, path }) => {
  params.allowOnly(["expand"]);
  return mustFind(ctx, path.id as string);
};

const update: ApiHandler = (ctx, { params: p, path, source }) => {
  p.allowOnly(["email", "metadata"]);
  const account = mustFind(ctx, path.id as string);
  const metadata = p.metadata("metadata", account.metadata);
  const email = p.has("email") ? (p.email("email") ?? null) : account.email;
  const previous = { email: account.email, metadata: { ...account.metadata } };
  Object.assign(account, { metadata, email });
  ctx.events.emit("account.updated", account, source, previous);
  return account;
};

const createLink: ApiHandler = (ctx, { params: p }) => {
  p.allowOnly(["account", "collect", "collection_options", "refresh_url", "return_url", "type"]);
  const account = mustFind(ctx, p.string("account", { required: true }) as string, "account");
  const type = p.oneOf("type", LINK_TYPES, { required: true }) as (typeof LINK_TYPES)[number];
  const now = ctx.store.now();
  const id = newId("link");
  ctx.store.state.account_links[id] = {
    id,
    account: account.id,
    expires_at: now + LINK_LIFETIME_SECONDS,
    refresh_url: p.url("refresh_url") ?? null,
    return_url: p.url("return_url") ?? null,
    type,
    used: false,
  };
  const link: AccountLink = {
    object: "account_link",
    created: now,
    expires_at: now + LINK_LIFETIME_SECONDS,
    url: `${ctx.publicUrl()}/connect/${account.id}?link=${id}`,
  };
  return link;
};

export const accountRoutes: ApiRoute[] = [
  { method: "POST", pattern: "/v1/accounts", handler: create },
  { method: "GET", pattern: "/v1/accounts/:id", handler: retrieve },
  { method: "POST", pattern: "/v1/accounts/:id", handler: update },
  { method: "POST", pattern: "/v1/account_links", handler: createLink },
];
