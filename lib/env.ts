import { z } from "zod";

/**
 * The one place that reads process.env. Local defaults make `npm start` and `npm test`
 * work with no hand-written env file; production overrides them.
 */
const ZEnv = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  DATABASE_URL: z
    .string()
    .url("DATABASE_URL must be a postgres:// URL")
    .default("postgres://postgres@127.0.0.1:54329/treadcast"),
  APP_URL: z.string().url().default("http://localhost:3000"),
  AUTH_SECRET: z.string().min(16).default("treadcast-local-development-secret-change-me"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  MAIL_FROM: z.string().default("Treadcast <no-reply@treadcast.test>"),
  /** Credentials for a real SMTP provider; the local mail fake needs none. */
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  /** "true" for implicit TLS (usually port 465); STARTTLS is used when the server offers it. */
  SMTP_SECURE: z
    .enum(["true", "false"])
    .default("false")
    .transform((v) => v === "true"),
  /** Failed password sign-ins, and e-mail link or reset requests, allowed per 15 minutes per address and per IP. */
  AUTH_LIMIT_PER_ADDRESS: z.coerce.number().int().positive().default(10),
  AUTH_LIMIT_PER_IP: z.coerce.number().int().positive().default(200),
  MAILBOX_ENABLED: z
    .enum(["true", "false"])
    .default("false")
    .transform((v) => v === "true"),
  UPLOAD_DIR: z.string().default("var/uploads"),
  /** The duty-cycle import queue's name; a test gives its own workers a queue of their own. */
  IMPORT_QUEUE: z
    .string()
    .regex(/^[\w.-]+$/, "IMPORT_QUEUE may hold letters, digits, '_', '.' and '-' only")
    .default("duty-cycle-import"),
  UPLOAD_LIMIT_BYTES: z.coerce
    .number()
    .int()
    .positive()
    .default(200 * 1024 * 1024),
  /** Payments: the Stripe secret key; the local fake accepts any sk_test_ key. */
  STRIPE_SECRET_KEY: z.string().default("sk_test_treadcast_local_fake"),
  /**
   * Where the Stripe API lives. Unset means the real service; `npm start` and `npm test` point it
   * at the local fake (http://127.0.0.1:STRIPE_FAKE_PORT).
   */
  STRIPE_API_BASE: z.preprocess((v) => (v === "" ? undefined : v), z.string().url().optional()),
  STRIPE_WEBHOOK_SECRET: z.string().min(8).default("whsec_treadcast_local_fake_secret"),
  STRIPE_FAKE_PORT: z.coerce.number().int().positive().default(12111),
  APP_VERSION: z.string().default(process.env.npm_package_version ?? "0.1.0"),
});

export type TEnv = z.infer<typeof ZEnv>;

let cached: TEnv | undefined;

export function getEnv(): TEnv {
  if (cached) return cached;
  const parsed = ZEnv.safeParse(process.env);
  if (!parsed.success) {
    const detail = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid environment: ${detail}`);
  }
  cached = parsed.data;
  return cached;
}
