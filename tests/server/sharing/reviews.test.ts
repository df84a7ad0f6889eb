import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, CLIENT, type Agent, type TestApp } from '../helpers/testApp';
import { linkIn, sentMail, waitForMail } from '../helpers/mail';

describe('customer review', () => {
  let t: TestApp;
  let designer: Agent;
  let designId: number;
  let otherDesignId: number;

  beforeAll(async () => {
    t = await buildTestApp();
    designer = await t.signIn('designer');
    const designs = (await designer.get('/api/designs')).body.designs;
    designId = designs[0].id;
    otherDesignId = designs[1].id;
  });
  afterAll(() => t.close());

  it('inviting a new e-mail makes a customer account whose invitation sets the password and opens the review', async () => {
    const invited = await designer.post(`/api/designs/${designId}/shares`).set(CLIENT).send({ email: 'New.Client@Example.com', displayName: 'Ada Client' });
    expect(invited.status).toBe(201);
    expect(invited.body.accountCreated).toBe(true);
    const mail = await waitForMail(t, (message) => message.to.includes('new.client@example.com'));
    expect(mail.subject).toContain('Please review');
    const token = new URL(linkIn(mail, '/reset-password')).searchParams.get('token')!;
    expect(linkIn(mail, `/reviews/${designId}`)).toBeTruthy();
    expect((await t.anonymous().post('/api/auth/password-reset/confirm').set(CLIENT).send({ token, newPassword: 'a-brand-new-password' })).status).toBe(204);
    const customer = await t.signInAs('new.client@example.com', 'a-brand-new-password');
    const list = await customer.get('/api/reviews');
    expect(list.body.designs.map((design: { designId: number }) => design.designId)).toEqual([designId]);
  });

  it('inviting an existing customer links the account; staff addresses are refused', async () => {
    const invited = await designer.post(`/api/designs/${designId}/shares`).set(CLIENT).send({ email: 'customer@harborlane.example' });
    expect(invited.body.accountCreated).toBe(false);
    const mail = await waitForMail(t, (message) => message.to.includes('customer@harborlane.example'));
    expect(mail.text).not.toContain('reset-password');
    const staff = await designer.post(`/api/designs/${designId}/shares`).set(CLIENT).send({ email: 'builder@harborlane.example' });
    expect(staff.status).toBe(409);
  });

  it('a customer sees only the designs shared with them', async () => {
    const customer = await t.signIn('customer');
    expect((await customer.get(`/api/reviews/${designId}`)).status).toBe(200);
    expect((await customer.get(`/api/reviews/${otherDesignId}`)).status).toBe(404);
    expect((await customer.get(`/api/designs/${designId}`)).status).toBe(403);
  });

  it('a pinned comment keeps its part and 3D position, and the designer gets an e-mail about it', async () => {
    const customer = await t.signIn('customer');
    const review = (await customer.get(`/api/reviews/${designId}`)).body;
    const partId = review.revision.document.profiles[0].id;
    const before = sentMail(t).length;
    const posted = await customer.post(`/api/reviews/${designId}/comments`).set(CLIENT).send({ revision: review.revision.number, partId, position: [120.5, 40, -300], body: 'Can this rail be 20 mm lower?' });
    expect(posted.status).toBe(201);
    expect(posted.body.comment).toMatchObject({ partId, position: [120.5, 40, -300], author: { role: 'customer' } });
    const mail = await waitForMail(t, (message) => message.subject.startsWith('New comment') && message.to.includes('designer@harborlane.example'));
    expect(mail.text).toContain('20 mm lower');
    expect(sentMail(t).length).toBeGreaterThan(before);
    const seen = (await designer.get(`/api/reviews/${designId}`)).body.comments;
    expect(seen.some((comment: { body: string }) => comment.body === 'Can this rail be 20 mm lower?')).toBe(true);
  });

  it('an approval records revision, person and time, shows in the history, and a later save needs its own approval', async () => {
    const customer = await t.signIn('customer');
    const review = (await customer.get(`/api/reviews/${designId}`)).body;
    const approved = await customer.post(`/api/reviews/${designId}/decisions`).set(CLIENT).send({ revision: review.revision.number, decision: 'approved', note: 'Looks right' });
    expect(approved.status).toBe(201);
    expect(approved.body.decision).toMatchObject({ revision: review.revision.number, decision: 'approved', decidedBy: { displayName: 'Priya Lindqvist' } });
    expect(Date.now() - new Date(approved.body.decision.decidedAt).getTime()).toBeLessThan(60_000);
    await waitForMail(t, (message) => message.subject.includes('approved') && message.to.includes('designer@harborlane.example'));

    const summary = (await designer.get('/api/designs')).body.designs.find((design: { id: number }) => design.id === designId);
    expect(summary.approval).toMatchObject({ revision: review.revision.number, decision: 'approved', current: true });

    const saved = await designer.post(`/api/designs/${designId}/revisions`).set(CLIENT).send({ baseRevision: review.revision.number, document: review.revision.document });
    expect(saved.status).toBe(201);
    const after = (await designer.get('/api/designs')).body.designs.find((design: { id: number }) => design.id === designId);
    expect(after.approval.current).toBe(false);
    const history = (await designer.get(`/api/designs/${designId}/history`)).body.revisions;
    expect(history[0].approval.state).toBe('not_reviewed');
    expect(history[1].approval).toMatchObject({ state: 'approved', by: 'Priya Lindqvist' });
  });

  it('refuses a decision on a revision that is no longer the latest, and decisions by staff', async () => {
    const customer = await t.signIn('customer');
    expect((await customer.post(`/api/reviews/${designId}/decisions`).set(CLIENT).send({ revision: 1, decision: 'approved' })).status).toBe(409);
    expect((await designer.post(`/api/reviews/${designId}/decisions`).set(CLIENT).send({ revision: 1, decision: 'approved' })).status).toBe(403);
  });

  it('a change request e-mails the designer', async () => {
    const customer = await t.signIn('customer');
    const latest = (await customer.get(`/api/reviews/${designId}`)).body.design.latestRevision;
    const asked = await customer.post(`/api/reviews/${designId}/decisions`).set(CLIENT).send({ revision: latest, decision: 'changes_requested', note: 'Wider shelf please' });
    expect(asked.status).toBe(201);
    const mail = await waitForMail(t, (message) => message.subject.startsWith('Changes requested'));
    expect(mail.text).toContain('Wider shelf please');
  });
});
