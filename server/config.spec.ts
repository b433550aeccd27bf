import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './config';

describe('loadConfig', () => {
  it('gives working defaults for development', () => {
    expect(loadConfig({})).toMatchObject({
      env: 'development',
      port: 3000,
      host: '127.0.0.1',
      dataDir: './data',
      demoAccounts: true,
      logLevel: 'info',
      session: { idleMs: 8 * 3_600_000, absoluteMs: 7 * 86_400_000 },
      mailLinks: { invitationMs: 7 * 86_400_000, passwordResetMs: 3_600_000 },
    });
    expect(loadConfig({}).databaseUrl).toBeUndefined();
  });

  it('names every bad variable', () => {
    const bad = () => loadConfig({ PORT: '70000', DATABASE_URL: 'mysql://x', SMTP_URL: 'not a url', NODE_ENV: 'staging', ALLOW_DEMO_IN_PRODUCTION: 'yes' });
    expect(bad).toThrow(ConfigError);
    let message = '';
    try {
      bad();
    } catch (err) {
      message = (err as Error).message;
    }
    expect(message).toContain('PORT: must be between 1 and 65535');
    expect(message).toContain('DATABASE_URL: must be a URL starting with postgres: or postgresql:');
    expect(message).toContain('SMTP_URL: must be a URL starting with smtp: or smtps:');
    expect(message).toContain('NODE_ENV: must be development, production or test');
    expect(message).toContain('ALLOW_DEMO_IN_PRODUCTION: must be "true" or "false"');
  });

  it('requires a session secret in production, and keeps demo accounts out unless allowed', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow('SESSION_SECRET: is required when NODE_ENV=production');
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: 'short' })).toThrow('SESSION_SECRET: must be at least 32 characters long');
    const secret = 's'.repeat(32);
    expect(loadConfig({ NODE_ENV: 'production', SESSION_SECRET: secret })).toMatchObject({ demoAccounts: false, secureCookies: true });
    expect(loadConfig({}).secureCookies).toBe(false);
    expect(loadConfig({ NODE_ENV: 'production', SESSION_SECRET: secret, ALLOW_DEMO_IN_PRODUCTION: 'true' }).demoAccounts).toBe(true);
  });

  it('treats an empty variable as unset and reads the rest', () => {
    const config = loadConfig({ PORT: '', DATABASE_URL: 'postgres://u@127.0.0.1:5432/shop', SESSION_IDLE_MINUTES: '30', NODE_ENV: 'test', INVITATION_DAYS: '14', PASSWORD_RESET_MINUTES: '' });
    expect(config).toMatchObject({
      port: 3000,
      databaseUrl: 'postgres://u@127.0.0.1:5432/shop',
      logLevel: 'silent',
      session: { idleMs: 1_800_000 },
      mailLinks: { invitationMs: 14 * 86_400_000, passwordResetMs: 3_600_000 },
    });
    expect(() => loadConfig({ PASSWORD_RESET_MINUTES: '1' })).toThrow('PASSWORD_RESET_MINUTES: must be between 5 and 1440');
    expect(loadConfig({ PUBLIC_URL: 'https://borewright.shop.example/' }).publicUrl).toBe('https://borewright.shop.example');
    expect(() => loadConfig({ PUBLIC_URL: 'borewright.shop.example' })).toThrow('PUBLIC_URL: must be a URL starting with http: or https:');
  });
});
