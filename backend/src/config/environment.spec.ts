import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadEnvironment } from './environment';

describe('loadEnvironment', () => {
  const dir = mkdtempSync(join(tmpdir(), 'tiermode-env-'));
  const databasePath = join(dir, 'db.sqlite');

  it('applies the defaults of the API contract', () => {
    const env = loadEnvironment({ DATABASE_PATH: databasePath, JWT_SECRET: 'x'.repeat(32) });
    expect(env.port).toBe(3000);
    expect(env.demoMode).toBe(true);
    expect(env.databasePath).toBe(databasePath);
  });

  it('generates a JWT secret once, keeps it beside the database and reuses it', () => {
    const first = loadEnvironment({ DATABASE_PATH: databasePath });
    const second = loadEnvironment({ DATABASE_PATH: databasePath });
    expect(first.jwtSecret.length).toBeGreaterThanOrEqual(32);
    expect(second.jwtSecret).toBe(first.jwtSecret);
    const file = join(dir, 'jwt-secret');
    expect(readFileSync(file, 'utf8').trim()).toBe(first.jwtSecret);
    expect(statSync(file).mode & 0o777).toBe(0o600);
  });

  it('names every bad variable', () => {
    expect(() =>
      loadEnvironment({
        PORT: '70000',
        JWT_SECRET: 'short',
        DEMO: 'maybe',
        DATABASE_PATH: databasePath,
      }),
    ).toThrow(
      /PORT must not be greater than 65535[\s\S]*JWT_SECRET must be at least 32[\s\S]*DEMO must be "on" or "off"/,
    );
    expect(() => loadEnvironment({ PORT: 'abc', DATABASE_PATH: databasePath })).toThrow(/PORT/);
  });

  it('reads DEMO=off', () => {
    expect(loadEnvironment({ DEMO: 'off', DATABASE_PATH: databasePath }).demoMode).toBe(false);
  });

  it('listens on this machine only while the demo accounts exist, unless HOST says otherwise', () => {
    expect(loadEnvironment({ DATABASE_PATH: databasePath }).host).toBe('127.0.0.1');
    expect(loadEnvironment({ DEMO: 'off', DATABASE_PATH: databasePath }).host).toBe('0.0.0.0');
    expect(loadEnvironment({ HOST: '192.0.2.10', DATABASE_PATH: databasePath }).host).toBe(
      '192.0.2.10',
    );
    expect(() => loadEnvironment({ HOST: 'a b', DATABASE_PATH: databasePath })).toThrow(
      /HOST must be an address or a host name/,
    );
  });

  it('reads the per-person limit on costly routes (120 a minute by default)', () => {
    expect(loadEnvironment({ DATABASE_PATH: databasePath }).expensiveRequestsPerMinute).toBe(120);
    expect(
      loadEnvironment({ RATE_LIMIT_PER_MINUTE: '30', DATABASE_PATH: databasePath })
        .expensiveRequestsPerMinute,
    ).toBe(30);
    expect(() =>
      loadEnvironment({ RATE_LIMIT_PER_MINUTE: '0', DATABASE_PATH: databasePath }),
    ).toThrow(/RATE_LIMIT_PER_MINUTE must be at least 1/);
  });
});
