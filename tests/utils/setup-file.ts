// Runs in each test file's worker: a fresh in-memory database and a fixed local environment.
import { afterAll, beforeAll } from "vitest";

process.env.DATABASE_URL = "memory://";
process.env.NEXTAUTH_SECRET ??= "test-secret-test-secret-test-secret-0123456789";
process.env.STRIPE_SECRET_KEY ??= "sk_test_gradeline_tests";
process.env.STRIPE_WEBHOOK_SECRET ??= "whsec_gradeline_tests";
process.env.S3_ACCESS_KEY_ID ??= "S3RVER";
process.env.S3_SECRET_ACCESS_KEY ??= "S3RVER";
process.env.APP_URL ??= "http://127.0.0.1:3999";
process.env.AUTH_LIMIT_PER_ACCOUNT ??= "5";
process.env.AUTH_LIMIT_PER_ADDRESS ??= "1000";

const g = globalThis as unknown as { __gradelineDb?: unknown; __gradelineEnv?: unknown };
g.__gradelineDb = undefined;
g.__gradelineEnv = undefined;

beforeAll(async () => {
  const { ensureBucket } = await import("@/lib/storage/client");
  await ensureBucket();
});

afterAll(async () => {
  const { closeDb } = await import("@/db/client");
  await closeDb();
});
