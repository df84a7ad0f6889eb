import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleDocument } from './helpers/fixtures';
import { buildTestApp, CLIENT, type Agent, type TestApp } from './helpers/testApp';

describe('POST /api/analysis', () => {
  let t: TestApp;
  let customer: Agent;
  beforeAll(async () => {
    t = await buildTestApp();
    customer = await t.signIn('customer');
  });
  afterAll(() => t.close());

  it('analyses a posted document for any signed-in user: findings, bill of materials and cut list', async () => {
    const response = await customer.post('/api/analysis').set(CLIENT).send({ document: sampleDocument('Analysed frame') });
    expect(response.status, JSON.stringify(response.body).slice(0, 500)).toBe(200);
    expect(Array.isArray(response.body.analysis.findings)).toBe(true);
    // Four loose profiles with no joints: the joint check must say something about their ends.
    expect(response.body.analysis.findings.length).toBeGreaterThan(0);
    expect(response.body.analysis).toHaveProperty('bom');
    expect(response.body.analysis).toHaveProperty('cutList');
  });

  it('refuses an invalid document with 400 and a field path into it', async () => {
    const document = sampleDocument('Broken');
    (document.profiles[0] as { direction: number[] }).direction = [1, 1, 0];
    const response = await customer.post('/api/analysis').set(CLIENT).send({ document });
    expect(response.status).toBe(400);
    expect(response.body.error.fields['document.profiles.0.direction']).toMatch(/unit vector/);
  });

  it('hands the body to the worker as text: broken JSON, a wrong shape and a missing body each get a 400 with a message', async () => {
    const broken = await customer.post('/api/analysis').set(CLIENT).set('Content-Type', 'application/json').send('{"document": [');
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('malformed_json');
    const extra = await customer.post('/api/analysis').set(CLIENT).send({ document: sampleDocument(), colour: 'red' });
    expect(extra.status).toBe(400);
    expect(extra.body.error.message).toMatch(/Unknown field: colour/);
    const missing = await customer.post('/api/analysis').set(CLIENT).send({});
    expect(missing.status).toBe(400);
    expect(missing.body.error.message).toMatch(/Send the design document/);
    const notJson = await customer.post('/api/analysis').set(CLIENT).set('Content-Type', 'text/plain').send('hello');
    expect(notJson.status).toBe(400);
    expect(notJson.body.error.message).toMatch(/Content-Type: application\/json/);
  });

  it('refuses anonymous visitors with 401', async () => {
    const response = await request(t.app).post('/api/analysis').set(CLIENT).send({ document: sampleDocument() });
    expect(response.status).toBe(401);
  });
});
