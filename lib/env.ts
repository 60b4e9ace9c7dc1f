import { z } from "zod";

const port = z.coerce.number().int().min(1).max(65535);
const optionalUrl = z.string().url().optional();

const envSchema = z
  .object({
    NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
    HOST: z.string().default("127.0.0.1"),
    PORT: port.default(3000),
    APP_URL: optionalUrl,
    DATA_DIR: z.string().min(1).default(".data"),
    DATABASE_URL: z
      .string()
      .regex(/^(postgres(ql)?:\/\/|memory:\/\/)/, "must start with postgres:// (a PostgreSQL server) or memory://")
      .optional(),
    NEXTAUTH_SECRET: z.string().min(32, "must be at least 32 characters (run: openssl rand -hex 32)"),
    NEXTAUTH_URL: optionalUrl,

    S3_ENDPOINT: optionalUrl,
    S3_REGION: z.string().default("us-east-1"),
    S3_BUCKET: z.string().regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, "must be a valid bucket name").default("gradeline-media"),
    S3_ACCESS_KEY_ID: z.string().min(1),
    S3_SECRET_ACCESS_KEY: z.string().min(1),
    S3_PUBLIC_ENDPOINT: optionalUrl,

    STRIPE_SECRET_KEY: z.string().regex(/^sk_(test|live)_/, "must start with sk_test_ or sk_live_"),
    STRIPE_WEBHOOK_SECRET: z.string().regex(/^whsec_/, "must start with whsec_"),
    STRIPE_API_HOST: z.string().optional(),
    STRIPE_API_PORT: port.optional(),
    STRIPE_API_PROTOCOL: z.enum(["http", "https"]).optional(),

    SMTP_HOST: z.string().default("127.0.0.1"),
    SMTP_PORT: port.default(1025),
    SMTP_SECURE: z.enum(["true", "false"]).default("false").transform((v) => v === "true"),
    SMTP_USER: z.string().optional(),
    SMTP_PASS: z.string().optional(),
    MAIL_FROM: z.string().default("Gradeline <hello@gradeline.test>"),

    MAILBOX_ENABLED: z.enum(["true", "false"]).default("false").transform((v) => v === "true"),
    AUTH_LIMIT_PER_ACCOUNT: z.coerce.number().int().positive().default(10),
    AUTH_LIMIT_PER_ADDRESS: z.coerce.number().int().positive().default(100),
    AUTH_LIMIT_WINDOW_SECONDS: z.coerce.number().int().positive().default(600),
    UPLOAD_SIGN_LIMIT: z.coerce.number().int().positive().default(60),
    UPLOAD_SIGN_LIMIT_WINDOW_SECONDS: z.coerce.number().int().positive().default(60),
    CHECKOUT_LIMIT: z.coerce.number().int().positive().default(10),
    CHECKOUT_LIMIT_WINDOW_SECONDS: z.coerce.number().int().positive().default(600),
  })
  .superRefine((env, ctx) => {
    const localMail = env.SMTP_HOST === "127.0.0.1" || env.SMTP_HOST === "localhost";
    if (env.NODE_ENV === "production" && env.MAILBOX_ENABLED && !localMail) {
      ctx.addIssue({ code: "custom", path: ["MAILBOX_ENABLED"], message: "the development mailbox only works with the local mail catcher, not a real mail server" });
    }
  });

export type Env = z.infer<typeof envSchema>;

export class EnvError extends Error {
  constructor(public readonly problems: string[]) {
    super(`Gradeline cannot start: the environment has ${problems.length} problem(s):\n${problems.map((p) => `  - ${p}`).join("\n")}\nSee .env.example for every setting.`);
    this.name = "EnvError";
  }
}

export function parseEnv(source: Record<string, string | undefined>): Env {
  const cleaned = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ""));
  const result = envSchema.safeParse(cleaned);
  if (!result.success) {
    throw new EnvError(result.error.issues.map((i) => `${i.path.join(".") || "(env)"}: ${i.message}`));
  }
  return result.data;
}

const globalForEnv = globalThis as unknown as { __gradelineEnv?: Env };

/** The parsed environment, read once per process. */
export function env(): Env {
  globalForEnv.__gradelineEnv ??= parseEnv(process.env);
  return globalForEnv.__gradelineEnv;
}

export function appUrl(): string {
  const e = env();
  return (e.APP_URL ?? e.NEXTAUTH_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/$/, "");
}
