import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed';
import { buildTestApp, CLIENT, dataSnapshot, demoEmail, sessionIdFromSetCookie, type TestApp } from './helpers/testApp';

const INVALID = {
  error: { code: 'invalid_credentials', message: 'That email and password do not match an active account.' },
};

describe('signing in and out', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('signs in a demo account and answers with the user, never the password hash', async () => {
    const response = await request(t.app)
      .post('/api/auth/sign-in')
      .set(CLIENT)
      .send({ email: 'Designer@HarborLane.example ', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({
      email: 'designer@harborlane.example',
      displayName: 'Tomasz Reyes',
      role: 'designer',
      active: true,
      preferences: { units: 'mm' },
    });
    expect(JSON.stringify(response.body)).not.toMatch(/password|\$2[aby]\$/i);
  });

  it('sets an httpOnly, SameSite=Lax session cookie named slotwise.sid', async () => {
    const response = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('owner'), password: DEMO_PASSWORD });
    const cookie = ([] as string[]).concat(response.headers['set-cookie'] ?? []).find((c) => c.startsWith('slotwise.sid='));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i); // plain HTTP in tests; Secure is set behind TLS
  });

  it('refuses a wrong password with 401 invalid_credentials', async () => {
    const response = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('owner'), password: 'not-the-password' });
    expect(response.status).toBe(401);
    expect(response.body).toEqual(INVALID);
    expect(response.headers['set-cookie']).toBeUndefined();
  });

  it('answers an unknown email exactly as it answers a wrong password', async () => {
    const wrong = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('builder'), password: 'wrong-password' });
    const unknown = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: 'nobody@harborlane.example', password: 'wrong-password' });
    expect(unknown.status).toBe(wrong.status);
    expect(unknown.body).toEqual(wrong.body);
    expect(unknown.body).toEqual(INVALID);
  });

  it('issues a new session id at sign-in, and the previous id stops working', async () => {
    const agent = request.agent(t.app);
    const first = await agent.post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('designer'), password: DEMO_PASSWORD });
    const firstCookie = ([] as string[]).concat(first.headers['set-cookie'] ?? []).find((c) => c.startsWith('slotwise.sid='))!.split(';')[0];
    const second = await agent.post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('owner'), password: DEMO_PASSWORD });
    const firstId = sessionIdFromSetCookie(first.headers['set-cookie']);
    const secondId = sessionIdFromSetCookie(second.headers['set-cookie']);
    expect(firstId).toBeDefined();
    expect(secondId).toBeDefined();
    expect(secondId).not.toBe(firstId);
    expect((await agent.get('/api/auth/me')).body.user.role).toBe('owner');
    const replay = await request(t.app).get('/api/auth/me').set('Cookie', firstCookie);
    expect(replay.status).toBe(200);
    expect(replay.body.user).toBeNull();
  });

  it('ignores a session id planted by someone else: sign-in answers with a different one', async () => {
    const planted = 's%3Aplanted-session-id.invalidsignature';
    const response = await request(t.app)
      .post('/api/auth/sign-in')
      .set(CLIENT)
      .set('Cookie', `slotwise.sid=${planted}`)
      .send({ email: demoEmail('designer'), password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    expect(sessionIdFromSetCookie(response.headers['set-cookie'])).not.toBe('planted-session-id');
  });

  it('signs out: the session is destroyed, the cookie cleared and the old cookie no longer works', async () => {
    const agent = await t.signIn('designer');
    const sessionsBefore = await t.db.models.Session.count();
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const signOut = await agent.post('/api/auth/sign-out').set(CLIENT);
    expect(signOut.status).toBe(204);
    expect(String(signOut.headers['set-cookie'])).toMatch(/slotwise\.sid=;.*Expires=Thu, 01 Jan 1970/);
    expect(await t.db.models.Session.count()).toBe(sessionsBefore - 1);
    expect((await agent.get('/api/auth/me')).body).toEqual({ user: null });
    expect((await agent.patch('/api/auth/me').set(CLIENT).send({})).status).toBe(401);
  });

  it('answers GET /api/auth/me without a session with 200 and no user, so an anonymous page logs no failed request', async () => {
    const response = await request(t.app).get('/api/auth/me');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ user: null });
    // Changing the account still needs a session.
    const patch = await request(t.app).patch('/api/auth/me').set(CLIENT).send({ displayName: 'Nobody' });
    expect(patch.status).toBe(401);
    expect(patch.body.error.code).toBe('unauthenticated');
  });
});

describe('the signed-in account', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('changes the display name and the units preference, and keeps them', async () => {
    const agent = await t.signIn('builder');
    const response = await agent.patch('/api/auth/me').set(CLIENT).send({ displayName: '  Ines V.  ', preferences: { units: 'in' } });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ displayName: 'Ines V.', preferences: { units: 'in' } });
    const again = await agent.get('/api/auth/me');
    expect(again.body.user).toMatchObject({ displayName: 'Ines V.', preferences: { units: 'in' } });
  });

  it('refuses an unknown units value with a field message and changes nothing', async () => {
    const agent = await t.signIn('customer');
    const before = await dataSnapshot(t.db);
    const response = await agent.patch('/api/auth/me').set(CLIENT).send({ preferences: { units: 'furlong' } });
    expect(response.status).toBe(400);
    expect(response.body.error.fields['preferences.units']).toBe('Choose mm or in');
    expect(await dataSnapshot(t.db)).toBe(before);
  });

  it('refuses a password change with the wrong current password, naming the field', async () => {
    const agent = await t.signIn('instructor');
    const before = await dataSnapshot(t.db);
    const response = await agent.post('/api/auth/me/password').set(CLIENT).send({ currentPassword: 'nope-nope-nope', newPassword: 'a-brand-new-password' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toEqual({ currentPassword: 'This is not your current password' });
    expect(await dataSnapshot(t.db)).toBe(before);
  });

  it('refuses a new password shorter than 10 characters', async () => {
    const agent = await t.signIn('instructor');
    const response = await agent.post('/api/auth/me/password').set(CLIENT).send({ currentPassword: DEMO_PASSWORD, newPassword: 'short' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.newPassword).toBe('Use at least 10 characters');
  });

  it('changes the password: the new one signs in, the old one does not, and other sessions end', async () => {
    const elsewhere = await t.signIn('instructor');
    const here = await t.signIn('instructor');
    const response = await here.post('/api/auth/me/password').set(CLIENT).send({ currentPassword: DEMO_PASSWORD, newPassword: 'instructor-new-pass-1' });
    expect(response.status).toBe(204);
    expect((await here.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).body.user).toBeNull();
    const old = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('instructor'), password: DEMO_PASSWORD });
    expect(old.status).toBe(401);
    await t.signInAs(demoEmail('instructor'), 'instructor-new-pass-1');
  });
});

describe('sign-in rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp({ rateLimit: { signInMax: 3, windowMs: 60_000 } });
  });
  afterAll(() => t.close());

  it('answers 429 rate_limited after too many failed attempts for one email, even with the right password', async () => {
    const attempt = (password: string) =>
      request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('customer'), password });
    for (let i = 0; i < 3; i += 1) expect((await attempt('wrong-password')).status).toBe(401);
    const limited = await attempt(DEMO_PASSWORD);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('rate_limited');
    expect(limited.body.error.message).toMatch(/Too many sign-in attempts/);
  });

  it('keeps counting per email: another account from the same address can still sign in', async () => {
    const response = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('owner'), password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
  });

  it('does not count successful sign-ins', async () => {
    for (let i = 0; i < 5; i += 1) {
      const response = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: demoEmail('designer'), password: DEMO_PASSWORD });
      expect(response.status).toBe(200);
    }
  });
});

describe('cross-site request defence and malformed requests', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('refuses a state-changing request without the X-Slotwise-Client header with 403 csrf and changes nothing', async () => {
    const agent = await t.signIn('designer');
    const before = await dataSnapshot(t.db);
    const response = await agent.post('/api/designs').send({ name: 'Sneaky', systemId: 'metric-40' });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('csrf');
    expect(await dataSnapshot(t.db)).toBe(before);
  });

  it('refuses sign-in without the header, so a cross-site form cannot sign a visitor in', async () => {
    const response = await request(t.app).post('/api/auth/sign-in').send({ email: demoEmail('owner'), password: DEMO_PASSWORD });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('csrf');
  });

  it('refuses a request whose Origin names another site, even with the header', async () => {
    const agent = await t.signIn('designer');
    const response = await agent.post('/api/designs').set(CLIENT).set('Origin', 'https://evil.example').send({ name: 'X', systemId: 'metric-40' });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('csrf');
  });

  it('accepts a request whose Origin matches the Host it was sent to', async () => {
    const agent = await t.signIn('designer');
    const response = await agent
      .post('/api/designs')
      .set(CLIENT)
      .set('Host', 'slotwise.test:8080')
      .set('Origin', 'http://slotwise.test:8080')
      .send({ name: 'Same origin', systemId: 'metric-40' });
    expect(response.status).toBe(201);
  });

  it('answers malformed JSON with 400 malformed_json', async () => {
    const response = await request(t.app).post('/api/auth/sign-in').set(CLIENT).set('Content-Type', 'application/json').send('{"email": ');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('malformed_json');
  });

  it('answers a body over 6 MB with 413 payload_too_large', async () => {
    const agent = await t.signIn('designer');
    const huge = JSON.stringify({ name: 'x'.repeat(6.5 * 1024 * 1024), systemId: 'metric-40' });
    const response = await agent.post('/api/designs').set(CLIENT).set('Content-Type', 'application/json').send(huge);
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('payload_too_large');
  });

  it('answers an unknown API route with 404 JSON', async () => {
    const response = await request(t.app).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe('not_found');
  });
});
