import { z } from "zod";

// The only reader of process.env. Defaults match scripts/db.sh and the dev mail catcher, so a fresh
// clone runs with no configuration; production sets every secret explicitly.
const port = z.coerce.number().int().min(1).max(65535);

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  APP_URL: z.url().default("http://127.0.0.1:3000"),
  DB_HOST: z.string().min(1).default("127.0.0.1"),
  DB_PORT: port.default(3407),
  DB_USER: z.string().min(1).default("borewise"),
  DB_PASSWORD: z.string().default("borewise-dev"),
  DB_NAME: z.string().regex(/^[A-Za-z0-9_]+$/).default("borewise"),
  DB_POOL_SIZE: z.coerce.number().int().min(1).max(200).default(10),
  DB_QUEUE_LIMIT: z.coerce.number().int().min(1).max(10_000).default(200),
  DB_CONNECT_TIMEOUT_MS: z.coerce.number().int().min(100).max(60_000).default(3000),
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: port.default(2525),
  SMTP_SECURE: z.stringbool().default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3).default("Borewise <no-reply@borewise.test>"),
  MAIL_CATCHER_HTTP_PORT: port.default(2580),
  // How often the outbox loop retries due mail (tests shorten it; the code path is the same).
  // Set by `npm start`: Next.js leaves SIGTERM/SIGINT to src/server/shutdown.ts.
  NEXT_MANUAL_SIG_HANDLE: z.stringbool().optional(),
  OUTBOX_POLL_MS: z.coerce.number().int().min(100).max(3_600_000).default(15_000),
  UPLOAD_DIR: z.string().min(1).default(".data/uploads"),
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).max(200 * 1024 * 1024).default(15 * 1024 * 1024),
  // Per-shop attachment storage (ASVS 5.0 V5.2.4 per-user quota, web-anchors A4).
  UPLOAD_SHOP_QUOTA_BYTES: z.coerce.number().int().min(1024 * 1024).max(1024 ** 4).default(2 * 1024 ** 3),
  // Reverse proxies in front of the app that append X-Forwarded-For. 0: the header is ignored.
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(5).default(0),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "silent"]).default("info"),
  COOKIE_SECURE: z.stringbool().optional(),
  // Card payment (issue 16). Outside production the SDK talks to scripts/payment-fake.ts on 127.0.0.1;
  // production sets STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET and leaves PAYMENT_API_BASE unset.
  STRIPE_SECRET_KEY: z.string().min(1).optional(),
  STRIPE_WEBHOOK_SECRET: z.string().min(1).optional(),
  PAYMENT_API_BASE: z.url().optional(),
  PAYMENT_FAKE_PORT: port.default(12111),
});

export type Env = z.infer<typeof envSchema>;

function parseEnv(): Env {
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Invalid environment: ${problems}`);
  }
  return parsed.data;
}

export const env = parseEnv();

const FAKE_SECRET_KEY = "sk_test_borewise_fake";
const FAKE_WEBHOOK_SECRET = "whsec_borewise_fake";

/** The payment provider's settings: the local fake's unless production (which must set real keys). */
export function paymentConfig(): { secretKey: string; webhookSecret: string; apiBase: string | null } {
  if (env.NODE_ENV === "production") {
    if (!env.STRIPE_SECRET_KEY || !env.STRIPE_WEBHOOK_SECRET) throw new Error("Invalid environment: STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET are required in production");
    return { secretKey: env.STRIPE_SECRET_KEY, webhookSecret: env.STRIPE_WEBHOOK_SECRET, apiBase: env.PAYMENT_API_BASE ?? null };
  }
  return {
    secretKey: env.STRIPE_SECRET_KEY ?? FAKE_SECRET_KEY,
    webhookSecret: env.STRIPE_WEBHOOK_SECRET ?? FAKE_WEBHOOK_SECRET,
    apiBase: env.PAYMENT_API_BASE ?? `http://127.0.0.1:${env.PAYMENT_FAKE_PORT}`,
  };
}

/** Cookies are Secure unless the app is served over plain HTTP (local development and tests). */
export const cookieSecure = env.COOKIE_SECURE ?? env.APP_URL.startsWith("https://");
