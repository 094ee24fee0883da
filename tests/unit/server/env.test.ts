import { describe, expect, it } from 'vitest';
import { readEnv } from '@server/env';

describe('reading the environment', () => {
  it('runs on embedded defaults', () => {
    expect(readEnv({})).toMatchObject({
      NODE_ENV: 'development',
      PORT: 3000,
      DATABASE_PATH: 'data/mixwright.sqlite',
      DATA_DIR: 'data',
      APP_URL: 'http://localhost:3000',
    });
  });

  it('listens on this machine only unless HOST says otherwise', () => {
    expect(readEnv({}).HOST).toBe('127.0.0.1');
    expect(readEnv({ HOST: '0.0.0.0' }).HOST).toBe('0.0.0.0');
  });

  it('derives the app address from PORT and drops a trailing slash from APP_URL', () => {
    expect(readEnv({ PORT: '4100' }).APP_URL).toBe('http://localhost:4100');
    expect(readEnv({ APP_URL: 'https://robots.example.org/' }).APP_URL).toBe('https://robots.example.org');
  });

  it('names the variable and the reason when a value is wrong', () => {
    expect(() => readEnv({ PORT: 'eighty' })).toThrow(/PORT: /);
  });

  it('insists on SMTP_URL in production', () => {
    expect(() => readEnv({ NODE_ENV: 'production' })).toThrow(/SMTP_URL: SMTP_URL is required in production/);
    expect(readEnv({ NODE_ENV: 'production', SMTP_URL: 'smtp://mail.example.org:587' }).SMTP_URL).toBe(
      'smtp://mail.example.org:587',
    );
  });

  it('treats an empty variable as unset', () => {
    const env = readEnv({ PORT: '', SMTP_URL: '' });
    expect(env.PORT).toBe(3000);
    expect(env.SMTP_URL).toBeUndefined();
  });
});
