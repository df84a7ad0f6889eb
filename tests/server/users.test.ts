import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, CLIENT, dataSnapshot, rowCounts, type Agent, type TestApp } from './helpers/testApp';

describe('people management by the owner', () => {
  let t: TestApp;
  let owner: Agent;
  beforeAll(async () => {
    t = await buildTestApp();
    owner = await t.signIn('owner');
  });
  afterAll(() => t.close());

  it('lists the five demo accounts without password hashes', async () => {
    const response = await owner.get('/api/users');
    expect(response.status).toBe(200);
    expect(response.body.users.map((user: { email: string }) => user.email)).toEqual([
      'owner@harborlane.example',
      'designer@harborlane.example',
      'builder@harborlane.example',
      'customer@harborlane.example',
      'instructor@harborlane.example',
    ]);
    expect(JSON.stringify(response.body)).not.toMatch(/passwordHash|password_hash/);
  });

  it('creates a user who can then sign in', async () => {
    const response = await owner
      .post('/api/users')
      .set(CLIENT)
      .send({ email: ' Kai.Mendes@HarborLane.example', displayName: 'Kai Mendes', role: 'builder', password: 'kai-password-123' });
    expect(response.status).toBe(201);
    expect(response.body.user).toMatchObject({ email: 'kai.mendes@harborlane.example', role: 'builder', active: true, preferences: { units: 'mm' } });
    const kai = await t.signInAs('kai.mendes@harborlane.example', 'kai-password-123');
    expect((await kai.get('/api/auth/me')).body.user.displayName).toBe('Kai Mendes');
  });

  it('refuses a second account with the same email with 409 email_taken and writes nothing', async () => {
    const before = await rowCounts(t.db);
    const response = await owner
      .post('/api/users')
      .set(CLIENT)
      .send({ email: 'BUILDER@harborlane.example', displayName: 'Copy', role: 'builder', password: 'copy-password-1' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('email_taken');
    expect(response.body.error.fields.email).toBeDefined();
    expect(await rowCounts(t.db)).toEqual(before);
  });

  it.each([
    [{}, 'email'],
    [{ email: 'not-an-email', displayName: 'X', role: 'builder', password: 'long-enough-pw' }, 'email'],
    [{ email: 'a@b.example', displayName: '', role: 'builder', password: 'long-enough-pw' }, 'displayName'],
    [{ email: 'a@b.example', displayName: 'A', role: 'admin', password: 'long-enough-pw' }, 'role'],
    [{ email: 'a@b.example', displayName: 'A', role: 'builder', password: 'short' }, 'password'],
    [{ email: 'a@b.example', displayName: 'A', role: 'builder', password: 'long-enough-pw', isAdmin: true }, '(body)'],
  ])('refuses the bad new-user body %j with 400, a message for %s, and no new row', async (body, field) => {
    const before = await rowCounts(t.db);
    const response = await owner.post('/api/users').set(CLIENT).send(body);
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('invalid_request');
    expect(response.body.error.message).toMatch(/\w/);
    expect(response.body.error.fields[field]).toMatch(/\w/);
    expect(await rowCounts(t.db)).toEqual(before);
  });

  it('changes another user’s role and display name', async () => {
    const id = await t.userId('customer');
    const response = await owner.patch(`/api/users/${id}`).set(CLIENT).send({ role: 'designer', displayName: 'Priya L.' });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ id, role: 'designer', displayName: 'Priya L.' });
    const priya = await t.signIn('designer').then(() => t.signInAs('customer@harborlane.example', 'slotwise-demo-2026'));
    expect((await priya.get('/api/designs')).status).toBe(200);
    await owner.patch(`/api/users/${id}`).set(CLIENT).send({ role: 'customer' });
    expect((await priya.get('/api/designs')).status).toBe(403);
  });

  it('refuses to let the owner demote or deactivate themselves', async () => {
    const id = await t.userId('owner');
    const before = await dataSnapshot(t.db);
    const demote = await owner.patch(`/api/users/${id}`).set(CLIENT).send({ role: 'designer' });
    expect(demote.status).toBe(400);
    expect(demote.body.error.code).toBe('cannot_change_self');
    expect(demote.body.error.fields.role).toMatch(/own role/);
    const deactivate = await owner.patch(`/api/users/${id}`).set(CLIENT).send({ active: false });
    expect(deactivate.status).toBe(400);
    expect(deactivate.body.error.fields.active).toMatch(/deactivate your own/);
    expect(await dataSnapshot(t.db)).toBe(before);
  });

  it('answers 404 for a user id that does not exist and 400 for one that is not a number', async () => {
    expect((await owner.patch('/api/users/99999').set(CLIENT).send({ displayName: 'Ghost' })).status).toBe(404);
    const bad = await owner.patch('/api/users/abc').set(CLIENT).send({ displayName: 'Ghost' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['params.id']).toMatch(/whole number/);
  });
});

describe('deactivated accounts', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('ends the deactivated user’s open session and refuses their sign-in like a wrong password', async () => {
    const owner = await t.signIn('owner');
    const builder = await t.signIn('builder');
    expect((await builder.get('/api/auth/me')).status).toBe(200);

    const id = await t.userId('builder');
    const response = await owner.patch(`/api/users/${id}`).set(CLIENT).send({ active: false });
    expect(response.status).toBe(200);
    expect(response.body.user.active).toBe(false);

    expect((await builder.get('/api/auth/me')).body.user).toBeNull();
    const signIn = await request(t.app).post('/api/auth/sign-in').set(CLIENT).send({ email: 'builder@harborlane.example', password: 'slotwise-demo-2026' });
    expect(signIn.status).toBe(401);
    expect(signIn.body.error).toEqual({ code: 'invalid_credentials', message: 'That email and password do not match an active account.' });

    await owner.patch(`/api/users/${id}`).set(CLIENT).send({ active: true });
    await t.signIn('builder');
  });

  it('stops a session even if its row survives, because every request reloads the user', async () => {
    const owner = await t.signIn('owner');
    const instructor = await t.signIn('instructor');
    const id = await t.userId('instructor');
    // Deactivate behind the API's back: the session row stays, the user is still refused.
    await t.db.models.User.update({ active: false }, { where: { id } });
    expect((await instructor.get('/api/auth/me')).body.user).toBeNull();
    await owner.patch(`/api/users/${id}`).set(CLIENT).send({ active: true });
  });
});
