import { describe, expect, it } from 'vitest';
import { parseEnv } from '../../../server/config/env';

describe('parseEnv', () => {
  it('applies defaults when only DATABASE_URL is given', () => {
    const env = parseEnv({ DATABASE_URL: 'postgres://u@127.0.0.1:5544/db' });
    expect(env).toMatchObject({ PORT: 3000, HOST: '127.0.0.1', NODE_ENV: 'development' });
  });

  it('names the variable when PORT is not a port number', () => {
    expect(() => parseEnv({ DATABASE_URL: 'postgres://u@h/db', PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => parseEnv({ DATABASE_URL: 'postgres://u@h/db', PORT: '70000' })).toThrow(
      /PORT must be between 1 and 65535/,
    );
  });

  it('names DATABASE_URL when it is missing or not a postgres URL', () => {
    expect(() => parseEnv({})).toThrow(/DATABASE_URL is required/);
    expect(() => parseEnv({ DATABASE_URL: 'mysql://x' })).toThrow(/DATABASE_URL must start with postgres/);
  });
});
