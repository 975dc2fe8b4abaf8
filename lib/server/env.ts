import { z } from "zod";

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/, error: "DATABASE_URL must be a postgres:// URL" }),
  /** Pool size per app instance. */
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  NEXTAUTH_SECRET: z.string().min(1).optional(),
  NEXTAUTH_URL: z.url().optional(),
  SMTP_URL: z.string().min(1).default("smtp://127.0.0.1:1025"),
  MAIL_FROM: z.string().min(1).default("Mooring <no-reply@mooring.test>"),
  /** Web address of the local fake mailbox's API; set only when the fake SMTP server is in use. */
  MAILBOX_URL: z.url().optional(),
  /** A sweep chunk still running after this long counts as lost (its worker died) and is retried. */
  SWEEP_JOB_EXPIRE_SECONDS: z.coerce.number().int().min(1).max(3600).default(120),
  /** How often sweep workers look for expired chunks. */
  SWEEP_MAINTENANCE_SECONDS: z.coerce.number().int().min(1).max(600).default(10),
  /** Compute budget of POST /api/spectrum per minute, in units of about 500 sector-levels: per anonymous client address. */
  SPECTRUM_BUDGET_ANONYMOUS: z.coerce.number().int().min(1).default(120),
  /** The same per signed-in account and per API token. */
  SPECTRUM_BUDGET_ACCOUNT: z.coerce.number().int().min(1).default(600),
});

/** Server environment, parsed once. */
export type Env = z.infer<typeof envSchema>;

let parsed: Env | undefined;

/**
 * Parses `process.env` on first use and returns the same object afterwards; throws with every
 * problem listed when the environment is invalid. Parsing lazily means importing a module (e.g.
 * while `next build` collects routes) does not by itself require the variables.
 */
export function getEnv(): Env {
  if (parsed) return parsed;
  const result = envSchema.safeParse(process.env);
  if (!result.success) {
    const problems = result.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Invalid environment:\n  ${problems.join("\n  ")}`);
  }
  parsed = result.data;
  return parsed;
}

