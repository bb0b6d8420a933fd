import "server-only";
import { z } from "zod";

// Validated once on first use, so `next build` never needs the secrets.
const envSchema = z
  .object({
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
    // Uploads go to an S3-compatible bucket when S3_BUCKET is set (lib/storage); the local disk otherwise.
    S3_ENDPOINT: z.url({ error: "S3_ENDPOINT must be a URL such as https://s3.example.net" }).optional(),
    S3_BUCKET: z.string().min(3, { error: "S3_BUCKET must name a bucket" }).optional(),
    S3_REGION: z.string().default("us-east-1"),
    S3_ACCESS_KEY_ID: z.string().optional(),
    S3_SECRET_ACCESS_KEY: z.string().optional(),
    S3_FORCE_PATH_STYLE: z.enum(["true", "false"], { error: "S3_FORCE_PATH_STYLE must be true or false" }).optional(),
    S3_PREFIX: z.string().default(""),
    NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  })
  .superRefine((e, ctx) => {
    const s3Settings = Object.entries(e).filter(
      ([k, v]) => k.startsWith("S3_") && k !== "S3_REGION" && k !== "S3_PREFIX" && v,
    );
    if (s3Settings.length && !e.S3_BUCKET)
      ctx.addIssue({ code: "custom", path: ["S3_BUCKET"], message: "S3_BUCKET is not set (other S3_ settings are)" });
    if (Boolean(e.S3_ACCESS_KEY_ID) !== Boolean(e.S3_SECRET_ACCESS_KEY))
      ctx.addIssue({
        code: "custom",
        path: ["S3_SECRET_ACCESS_KEY"],
        message: "S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY go together",
      });
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
