import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from '../helpers/testApp';

describe('embedding the link viewer', () => {
  let t: TestApp;
  let dist: string;
  beforeAll(async () => {
    dist = mkdtempSync(join(tmpdir(), 'slotwise-embed-dist-'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Slotwise</title><div id="root"></div>');
    t = await buildTestApp({ nodeEnv: 'production', clientDist: dist });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dist, { recursive: true, force: true });
  });

  it('opens frame-ancestors for /view/* only; other pages stay unframeable', async () => {
    const viewer = await t.anonymous().get(`/view/${'A'.repeat(43)}`);
    expect(viewer.status).toBe(200);
    expect(viewer.headers['content-security-policy']).toContain('frame-ancestors *');
    expect(viewer.headers['x-frame-options']).toBeUndefined();
    const signIn = await t.anonymous().get('/sign-in');
    expect(signIn.headers['content-security-policy']).toContain("frame-ancestors 'self'");
    expect(signIn.headers['x-frame-options']).toBe('SAMEORIGIN');
  });
});
