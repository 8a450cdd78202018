import { z } from 'zod';

const flag = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce
    .number({ error: () => 'must be a port number' })
    .int({ error: () => 'must be a whole port number' })
    .min(1, { error: () => 'must be between 1 and 65535' })
    .max(65535, { error: () => 'must be between 1 and 65535' })
    .default(3000),
  DATABASE_URL: z
    .string({ error: () => 'is required (postgres://user@host:port/database)' })
    .regex(/^postgres(ql)?:\/\//, { error: () => 'must start with postgres:// or postgresql://' }),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  CLIENT_DIR: z.string().optional(),
  // Where links in e-mails point; the browser's address of the app (Vite's in `npm run dev`).
  APP_URL: z.url({ error: () => 'must be a URL such as https://seamwright.example' }).optional(),
  // Outgoing mail. A hosted provider needs only these variables, no code change.
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(587),
  SMTP_SECURE: flag.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Seamwright <no-reply@seamwright.example>'),
  // `on` runs the local SMTP catcher inside the server and shows its messages at /dev/outbox.
  // Development and tests default to on; production to off.
  MAIL_CATCHER: z.enum(['on', 'off']).optional(),
  // Attempts per window per client for the sign-in, sign-up and reset routes.
  RATE_LIMIT_WINDOW_MINUTES: z.coerce.number().positive().default(15),
  RATE_LIMIT_SIGN_IN: z.coerce.number().int().positive().default(10),
  RATE_LIMIT_SIGN_UP: z.coerce.number().int().positive().default(5),
  RATE_LIMIT_RESET: z.coerce.number().int().positive().default(5),
  // Counters are kept in PostgreSQL under this name, shared by every server process that uses the same one.
  // Worker threads that build solids; default one per core.
  GEOMETRY_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  RATE_LIMIT_SCOPE: z
    .string()
    .regex(/^[A-Za-z0-9_-]{1,40}$/, { error: () => 'must be 1–40 letters, digits, - or _' })
    .default('seamwright'),
});
export type Env = Omit<z.infer<typeof envSchema>, 'MAIL_CATCHER'> & { MAIL_CATCHER: 'on' | 'off' };

/** Thrown when the environment is unusable; the message names every bad variable. */
export class EnvError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EnvError';
  }
}

/** Reads the server's settings from environment variables, naming each bad one in the error. */
export function parseEnv(source: Record<string, string | undefined>): Env {
  const result = envSchema.safeParse(source);
  if (result.success) return withMailDefaults(result.data);
  const lines = result.error.issues.map((issue) => `${issue.path.join('.')} ${issue.message}`);
  throw new EnvError(`Bad environment variable${lines.length > 1 ? 's' : ''}: ${lines.join('; ')}`);
}

// Production must name a real SMTP server (or opt into the catcher for a local demo); elsewhere the
// catcher is the default so no message ever leaves the machine by accident.
function withMailDefaults(env: z.infer<typeof envSchema>): Env {
  const catcher = env.MAIL_CATCHER ?? (env.NODE_ENV === 'production' ? 'off' : 'on');
  if (catcher === 'off' && !env.SMTP_HOST) {
    throw new EnvError('Bad environment variable: SMTP_HOST is required unless MAIL_CATCHER=on');
  }
  return { ...env, MAIL_CATCHER: catcher };
}
