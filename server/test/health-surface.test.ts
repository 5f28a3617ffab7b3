import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConfigError, loadSettings } from '../src/config/env.js';
import { createTestContext, type TestContext } from './test-context.js';

/** The HTTP surface around the API: built UI, SPA fallback, OpenAPI, body limits, config. */
describe('HTTP surface', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    const ui = path.join(mkdtempSync(path.join(tmpdir(), 'holdfast-ui-')), 'dist');
    mkdirSync(path.join(ui, 'assets'), { recursive: true });
    writeFileSync(
      path.join(ui, 'index.html'),
      '<!doctype html><title>Holdfast</title><div id="root"></div>',
    );
    writeFileSync(path.join(ui, 'assets', 'app.js'), 'console.log("ui")');
    ctx = await createTestContext({ env: { UI_DIST: ui } });
  });
  afterAll(() => ctx?.close());

  it('serves the built UI at / and its assets', async () => {
    const page = await ctx.request('GET', '/');
    expect(page.status).toBe(200);
    expect(page.headers.get('content-type')).toMatch(/text\/html/);
    expect(page.text).toContain('<div id="root">');
    const asset = await ctx.request('GET', '/assets/app.js');
    expect(asset.status).toBe(200);
    expect(asset.headers.get('content-type')).toMatch(/javascript/);
  });

  it('answers client-side routes with index.html, but never /api paths', async () => {
    const deep = await ctx.request('GET', '/sheets/HF-0001/revisions/3');
    expect(deep.status).toBe(200);
    expect(deep.text).toContain('<title>Holdfast</title>');
    const api = await ctx.request('GET', '/api/sheets-that-do-not-exist');
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe('not_found');
  });

  it('publishes the OpenAPI document with the routes and their request schemas', async () => {
    const doc = await ctx.request('GET', '/api/docs-json');
    expect(doc.status).toBe(200);
    expect(doc.body.openapi).toMatch(/^3\./);
    expect(Object.keys(doc.body.paths)).toEqual(
      expect.arrayContaining(['/api/auth/sign-in', '/api/users/{id}', '/api/health']),
    );
    const signIn =
      doc.body.paths['/api/auth/sign-in'].post.requestBody.content['application/json'].schema;
    expect(signIn.required).toEqual(expect.arrayContaining(['email', 'password']));
    expect(signIn.additionalProperties).toBe(false);
    const ui = await ctx.request('GET', '/api/docs');
    expect(ui.status).toBe(200);
    expect(ui.text).toMatch(/swagger/i);
  });

  it('limits JSON bodies to 1 MB and explains malformed JSON, in the error shape', async () => {
    const big = JSON.stringify({ email: 'a@holdfast.test', password: 'x'.repeat(1_100_000) });
    const tooBig = await ctx.request('POST', '/api/auth/sign-in', {
      raw: big,
      contentType: 'application/json',
    });
    expect(tooBig.status).toBe(413);
    expect(tooBig.body.error.code).toBe('payload_too_large');
    const broken = await ctx.request('POST', '/api/auth/sign-in', {
      raw: '{"email":',
      contentType: 'application/json',
    });
    expect(broken.status).toBe(400);
    expect(broken.body.error).toEqual({
      code: 'validation_failed',
      message: 'The request body is not valid JSON.',
    });
  });
});

describe('configuration', () => {
  it('stops with a message naming every bad variable', () => {
    try {
      loadSettings({ DATABASE_URL: 'mysql://x', PORT: 'eighty', LOG_LEVEL: 'loud' });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ConfigError);
      const message = (error as Error).message;
      expect(message).toMatch(/DATABASE_URL: must start with postgres:\/\//);
      expect(message).toMatch(/PORT:/);
      expect(message).toMatch(/LOG_LEVEL:/);
    }
    expect(() => loadSettings({})).toThrow(/DATABASE_URL: is required/);
  });

  it('applies defaults and keeps one generated JWT secret across restarts', () => {
    const dataDir = mkdtempSync(path.join(tmpdir(), 'holdfast-secret-'));
    const a = loadSettings({ DATABASE_URL: 'postgres://u:p@127.0.0.1:5/db', DATA_DIR: dataDir });
    const b = loadSettings({
      DATABASE_URL: 'postgres://u:p@127.0.0.1:5/db',
      DATA_DIR: dataDir,
      PORT: '',
    });
    expect(a).toMatchObject({
      PORT: 3000,
      HOST: '127.0.0.1',
      PUBLIC_URL: 'http://127.0.0.1:3000',
      LOGIN_THROTTLE_LIMIT: 10,
    });
    expect(a.JWT_SECRET.length).toBeGreaterThanOrEqual(32);
    expect(b.JWT_SECRET).toBe(a.JWT_SECRET);
    expect(() => loadSettings({ DATABASE_URL: 'postgres://x', JWT_SECRET: 'short' })).toThrow(
      /JWT_SECRET: must be at least 32/,
    );
  });
});
