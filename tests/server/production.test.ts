import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, CLIENT, type TestApp } from './helpers/testApp';

describe('the production server', () => {
  let t: TestApp;
  let dist: string;
  beforeAll(async () => {
    dist = mkdtempSync(join(tmpdir(), 'slotwise-dist-'));
    mkdirSync(join(dist, 'assets'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Slotwise</title><div id="root"></div>');
    writeFileSync(join(dist, 'assets', 'index-4f2a9c1b.js'), 'console.log("slotwise");');
    t = await buildTestApp({ nodeEnv: 'production', clientDist: dist });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dist, { recursive: true, force: true });
  });

  it('sends a Content Security Policy that allows the 3D viewer’s workers and blob images and nothing from elsewhere', async () => {
    const response = await request(t.app).get('/');
    const csp = String(response.headers['content-security-policy']);
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("worker-src 'self' blob:");
    expect(csp).toContain("img-src 'self' data: blob:");
    expect(csp).toContain("connect-src 'self' blob: data:");
    expect(csp).toContain("object-src 'none'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe/);
    expect(csp).not.toMatch(/https?:/);
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('serves the client’s index page for client routes, uncached', async () => {
    const response = await request(t.app).get('/designs/12');
    expect(response.status).toBe(200);
    expect(response.text).toContain('<div id="root">');
    expect(response.headers['cache-control']).toBe('no-cache');
  });

  it('caches hashed assets for a year as immutable', async () => {
    const response = await request(t.app).get('/assets/index-4f2a9c1b.js');
    expect(response.status).toBe(200);
    expect(response.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('answers a missing asset with 404 instead of the index page', async () => {
    expect((await request(t.app).get('/assets/index-gone.js')).status).toBe(404);
  });

  it('answers unknown API routes with 404 JSON, not the index page', async () => {
    const response = await request(t.app).get('/api/designz');
    expect(response.status).toBe(404);
    expect(response.headers['content-type']).toMatch(/json/);
    expect(response.body.error.code).toBe('not_found');
  });

  it('marks the session cookie Secure when the request arrived over TLS through a trusted proxy', async () => {
    const behindProxy = await buildTestApp({ nodeEnv: 'production', clientDist: dist });
    behindProxy.app.set('trust proxy', 1);
    try {
      const response = await request(behindProxy.app)
        .post('/api/auth/sign-in')
        .set(CLIENT)
        .set('X-Forwarded-Proto', 'https')
        .send({ email: 'owner@harborlane.example', password: 'slotwise-demo-2026' });
      expect(response.status).toBe(200);
      expect(String(response.headers['set-cookie'])).toMatch(/slotwise\.sid=.*; Secure/);
    } finally {
      await behindProxy.close();
    }
  });
});
