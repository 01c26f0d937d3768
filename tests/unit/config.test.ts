import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/lib/config';

describe('configuration from the environment', () => {
  it('has defaults for the local run', () => {
    const c = loadConfig({});
    expect(c.PORT).toBe(3000);
    expect(c.HOST).toBe('127.0.0.1');
    expect(c.APP_URL).toBe('http://127.0.0.1:3000');
    expect(c.DATABASE_URL).toContain(':54329/');
  });

  it('derives APP_URL from HOST and PORT, and strips a trailing slash from a given one', () => {
    expect(loadConfig({ PORT: '3100' }).APP_URL).toBe('http://127.0.0.1:3100');
    expect(loadConfig({ APP_URL: 'https://quotes.aldercreek.example/' }).APP_URL).toBe('https://quotes.aldercreek.example');
  });

  it('stops with a message naming each bad variable', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => loadConfig({ PORT: '70000' })).toThrow(/PORT/);
    expect(() => loadConfig({ DATABASE_URL: 'mysql://x' })).toThrow(/DATABASE_URL: must be a postgres:\/\/ URL/);
    expect(() => loadConfig({ SESSION_SECRET: 'short' })).toThrow(/SESSION_SECRET: must be at least 16 characters/);
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET: set a secret of your own/);
    expect(() => loadConfig({ SMTP_URL: 'http://mail', NODE_ENV: 'staging' })).toThrow(/SMTP_URL[\s\S]*NODE_ENV|NODE_ENV[\s\S]*SMTP_URL/);
  });
});
