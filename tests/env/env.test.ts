import { describe, expect, it } from "vitest";

import { EnvError, parseEnv } from "@/lib/env";

const good = {
  NEXTAUTH_SECRET: "x".repeat(40),
  S3_ACCESS_KEY_ID: "key",
  S3_SECRET_ACCESS_KEY: "secret",
  STRIPE_SECRET_KEY: "sk_test_abc",
  STRIPE_WEBHOOK_SECRET: "whsec_abc",
};

function problems(source: Record<string, string>): string[] {
  try {
    parseEnv(source);
    return [];
  } catch (error) {
    expect(error).toBeInstanceOf(EnvError);
    return (error as EnvError).problems;
  }
}

describe("environment parsing", () => {
  it("accepts a complete environment and fills the defaults", () => {
    const env = parseEnv(good);
    expect(env.PORT).toBe(3000);
    expect(env.DATA_DIR).toBe(".data");
    expect(env.MAILBOX_ENABLED).toBe(false);
  });

  it("names every missing setting", () => {
    expect(problems({}).map((p) => p.split(":")[0]).sort()).toEqual(["NEXTAUTH_SECRET", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY", "STRIPE_SECRET_KEY", "STRIPE_WEBHOOK_SECRET"]);
  });

  it.each([
    ["PORT", "eighty", "PORT"],
    ["PORT", "70000", "PORT"],
    ["DATABASE_URL", "mysql://x", "DATABASE_URL"],
    ["STRIPE_SECRET_KEY", "pk_test_123", "STRIPE_SECRET_KEY"],
    ["NEXTAUTH_SECRET", "short", "NEXTAUTH_SECRET"],
    ["S3_ENDPOINT", "not a url", "S3_ENDPOINT"],
  ])("refuses %s=%s with a message naming it", (key, value, named) => {
    const found = problems({ ...good, [key]: value });
    expect(found).toHaveLength(1);
    expect(found[0].startsWith(`${named}:`)).toBe(true);
  });

  it("refuses the development mailbox in production with a real mail server", () => {
    expect(problems({ ...good, NODE_ENV: "production", MAILBOX_ENABLED: "true", SMTP_HOST: "smtp.example.com" })[0]).toMatch(/^MAILBOX_ENABLED/);
    expect(problems({ ...good, NODE_ENV: "production", MAILBOX_ENABLED: "true" })).toEqual([]);
  });

  it("reads an empty value as unset", () => {
    expect(parseEnv({ ...good, PORT: "" }).PORT).toBe(3000);
  });
});
