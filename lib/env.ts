import "server-only";
import { z } from "zod";

// Validated once on first use, so `next build` never needs the secrets.
const envSchema = z.object({
  DATABASE_URL: z
    .string({ error: "DATABASE_URL is not set" })
    .regex(/^mariadb:\/\//, { error: "DATABASE_URL must start with mariadb://" }),
  SESSION_SECRET: z
    .string({ error: "SESSION_SECRET is not set" })
    .min(32, { error: "SESSION_SECRET must be at least 32 characters" }),
  SMTP_URL: z.string().optional(),
  MAIL_OUTBOX_DIR: z.string().optional(),
  MAIL_FROM: z.string().default("Throwline <paperwork@throwline.invalid>"),
  STORAGE_DIR: z.string().default(".data/uploads"),
  S3_ENDPOINT: z.string().optional(),
  S3_BUCKET: z.string().optional(),
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
});

export type Env = z.infer<typeof envSchema>;
let cached: Env | null = null;

export function env(): Env {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`Throwline cannot start with this environment — ${problems}`);
  }
  cached = parsed.data;
  return cached;
}
