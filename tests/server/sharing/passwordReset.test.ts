import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, CLIENT, type TestApp } from '../helpers/testApp';
import { linkIn, sentMail, waitForMail } from '../helpers/mail';

describe('password reset', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('answers the same whether or not the account exists, and mails only real accounts', async () => {
    const known = await t.anonymous().post('/api/auth/password-reset').set(CLIENT).send({ email: 'builder@harborlane.example' });
    const unknown = await t.anonymous().post('/api/auth/password-reset').set(CLIENT).send({ email: 'nobody@harborlane.example' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    await waitForMail(t, (message) => message.to.includes('builder@harborlane.example'));
    expect(sentMail(t).some((message) => message.to.includes('nobody@harborlane.example'))).toBe(false);
  });

  it('the e-mailed token sets a new password once, ends old sessions, and cannot be used again', async () => {
    const oldSession = await t.signIn('designer');
    await t.anonymous().post('/api/auth/password-reset').set(CLIENT).send({ email: 'designer@harborlane.example' });
    const mail = await waitForMail(t, (message) => message.to.includes('designer@harborlane.example') && message.subject.includes('Reset'));
    const token = new URL(linkIn(mail, '/reset-password')).searchParams.get('token')!;
    expect((await t.anonymous().post('/api/auth/password-reset/confirm').set(CLIENT).send({ token, newPassword: 'fresh-password-2026' })).status).toBe(204);
    expect((await oldSession.get('/api/auth/me')).body.user).toBeNull();
    await t.signInAs('designer@harborlane.example', 'fresh-password-2026');
    const again = await t.anonymous().post('/api/auth/password-reset/confirm').set(CLIENT).send({ token, newPassword: 'another-password-99' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
  });

  it('refuses an expired token', async () => {
    await t.anonymous().post('/api/auth/password-reset').set(CLIENT).send({ email: 'owner@harborlane.example' });
    const mail = await waitForMail(t, (message) => message.to.includes('owner@harborlane.example'));
    const token = new URL(linkIn(mail, '/reset-password')).searchParams.get('token')!;
    await t.db.models.PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: {} });
    expect((await t.anonymous().post('/api/auth/password-reset/confirm').set(CLIENT).send({ token, newPassword: 'owner-new-password' })).status).toBe(400);
  });
});
