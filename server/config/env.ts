import { z } from 'zod';

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
});
export type Env = z.infer<typeof envSchema>;

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
  if (result.success) return result.data;
  const lines = result.error.issues.map((issue) => `${issue.path.join('.')} ${issue.message}`);
  throw new EnvError(`Bad environment variable${lines.length > 1 ? 's' : ''}: ${lines.join('; ')}`);
}
