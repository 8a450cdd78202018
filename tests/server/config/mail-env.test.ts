import { describe, expect, it } from 'vitest';
import { parseEnv } from '../../../server/config/env';
import { authSettingsFromEnv } from '../../../server/config/auth-settings';

const DATABASE_URL = 'postgres://u@127.0.0.1:5544/db';

describe('parseEnv mail settings', () => {
  it('runs the local mail catcher by default outside production', () => {
    expect(parseEnv({ DATABASE_URL }).MAIL_CATCHER).toBe('on');
    expect(parseEnv({ DATABASE_URL, NODE_ENV: 'test' }).MAIL_CATCHER).toBe('on');
  });

  it('needs SMTP_HOST in production unless the catcher is asked for', () => {
    expect(() => parseEnv({ DATABASE_URL, NODE_ENV: 'production' })).toThrow(/SMTP_HOST is required/);
    const smtp = parseEnv({
      DATABASE_URL,
      NODE_ENV: 'production',
      SMTP_HOST: 'smtp.mail.example',
      SMTP_SECURE: 'true',
    });
    expect(smtp).toMatchObject({ MAIL_CATCHER: 'off', SMTP_PORT: 587, SMTP_SECURE: true });
    expect(parseEnv({ DATABASE_URL, NODE_ENV: 'production', MAIL_CATCHER: 'on' }).MAIL_CATCHER).toBe('on');
  });

  it('reads rate limits and the app address', () => {
    const env = parseEnv({ DATABASE_URL, RATE_LIMIT_SIGN_IN: '4', APP_URL: 'https://seamwright.example' });
    const settings = authSettingsFromEnv(env);
    expect(settings.rateLimits.signIn).toEqual({ windowMs: 15 * 60_000, limit: 4 });
    expect(settings.appUrl).toBe('https://seamwright.example');
    expect(() => parseEnv({ DATABASE_URL, APP_URL: 'not a url' })).toThrow(/APP_URL/);
  });
});
