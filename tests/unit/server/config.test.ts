import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '@server/config/env';

describe('loadConfig', () => {
  it('when PORT is not a number, then the message names PORT', () => {
    expect(() => loadConfig({ PORT: 'abc' })).toThrow(ConfigError);
    expect(() => loadConfig({ PORT: 'abc' })).toThrow(/PORT/);
  });

  it('when DATABASE_URL is not a postgres URL, then the message names DATABASE_URL', () => {
    expect(() => loadConfig({ DATABASE_URL: 'mysql://x@y/z' })).toThrow(/DATABASE_URL/);
  });

  it('when nothing is set, then it serves 127.0.0.1:3000 with a base URL to match', () => {
    const c = loadConfig({});
    expect(c).toMatchObject({
      host: '127.0.0.1',
      port: 3000,
      baseUrl: 'http://127.0.0.1:3000',
      isProduction: false,
    });
  });

  it('when UPLOADS_DIR is not set, then photos go to .data/uploads as an absolute path; inside the served client it refuses to start', () => {
    expect(loadConfig({}).uploadsDir).toBe(resolve('.data/uploads'));
    expect(() => loadConfig({ UPLOADS_DIR: 'dist/client/uploads' })).toThrow(/UPLOADS_DIR must be outside/);
    expect(() => loadConfig({ UPLOADS_DIR: 'public' })).toThrow(/UPLOADS_DIR/);
    expect(loadConfig({ UPLOADS_DIR: '/var/lib/shoalwise/photos' }).uploadsDir).toBe(
      '/var/lib/shoalwise/photos',
    );
  });

  it('when production lacks a session secret, then it refuses to start', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', PUBLIC_BASE_URL: 'https://club.example' })).toThrow(
      /SESSION_SECRET/,
    );
  });

  it('when production does not say which proxies to trust, then it refuses to start, naming TRUST_PROXY', () => {
    const prod = {
      NODE_ENV: 'production',
      PUBLIC_BASE_URL: 'https://club.example',
      SESSION_SECRET: 's'.repeat(32),
    };
    expect(() => loadConfig(prod)).toThrow(/TRUST_PROXY is required/);
    expect(loadConfig({ ...prod, TRUST_PROXY: 'none' }).trustProxy).toBe(false);
  });

  it('when TRUST_PROXY names hops or proxies, then Express gets them; "true" (believe anyone) and junk are refused', () => {
    expect(loadConfig({}).trustProxy).toBe(false);
    expect(loadConfig({ TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ TRUST_PROXY: 'loopback, 10.0.0.0/8, fd00::/8, 192.0.2.7' }).trustProxy).toEqual([
      'loopback',
      '10.0.0.0/8',
      'fd00::/8',
      '192.0.2.7',
    ]);
    for (const bad of ['true', '0', '11', '10.0.0.0/33', 'proxy.example', 'loopback,,nonsense']) {
      expect(() => loadConfig({ TRUST_PROXY: bad }), bad).toThrow(/TRUST_PROXY/);
    }
  });
});
