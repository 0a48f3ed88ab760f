import { z } from "zod";

// Every environment variable Axisline reads enters here. A bad value stops the
// process at start with a sentence naming the variable and the reason.

const url = (what: string) => z.string({ error: `must be set to ${what}` }).url({ error: `must be a URL (${what})` });
const port = z.coerce
  .number({ error: "must be a port number" })
  .int({ error: "must be a whole number" })
  .min(1, { error: "must be between 1 and 65535" })
  .max(65535, { error: "must be between 1 and 65535" });

const EnvSchema = z.object({
  DATABASE_URL: z
    .string({ error: "must be set to a PostgreSQL connection URL" })
    .regex(/^postgres(ql)?:\/\//, { error: "must start with postgres:// or postgresql://" }),
  NEXTAUTH_URL: url("the public base URL of the app, e.g. http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z
    .string({ error: "must be set to a random secret of at least 32 characters" })
    .min(32, { error: "must be at least 32 characters long (use `openssl rand -hex 32`)" }),
  SERVICES_MODE: z.enum(["local", "hosted"], { error: 'must be "local" (loopback fakes) or "hosted" (real services)' }).default("local"),
  SMTP_HOST: z.string().min(1, { error: "must name the SMTP host" }).default("127.0.0.1"),
  SMTP_PORT: port.default(2525),
  SMTP_SECURE: z.enum(["true", "false"], { error: 'must be "true" or "false"' }).default("false"),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3, { error: "must be a sender address" }).default("Axisline <no-reply@axisline.test>"),
  MAIL_CATCHER_URL: url("the HTTP address of the local mail catcher").default("http://127.0.0.1:2580"),
});

export type Env = z.infer<typeof EnvSchema>;

export class EnvError extends Error {}

export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = EnvSchema.safeParse(source);
  if (!result.success) {
    const lines = result.error.issues.map((issue) => `  ${issue.path.join(".") || "(environment)"} ${issue.message}`);
    throw new EnvError(`Axisline cannot start: the environment is not valid.\n${lines.join("\n")}\nSee .env.example for every variable.`);
  }
  if (result.data.SERVICES_MODE === "hosted" && result.data.NEXTAUTH_URL.startsWith("http://") && !isLoopback(result.data.NEXTAUTH_URL)) {
    throw new EnvError("Axisline cannot start: NEXTAUTH_URL must use https:// when SERVICES_MODE is hosted.");
  }
  return result.data;
}

function isLoopback(value: string): boolean {
  const host = new URL(value).hostname;
  return host === "localhost" || host === "127.0.0.1" || host === "[::1]";
}

let cached: Env | undefined;
export function env(): Env {
  cached ??= parseEnv(process.env);
  return cached;
}

/** Cookies are Secure everywhere except a loopback http:// origin (local demo and tests). */
export function secureCookies(): boolean {
  return !isLoopback(env().NEXTAUTH_URL) || env().NEXTAUTH_URL.startsWith("https://");
}
