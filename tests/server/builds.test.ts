import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDesignsService } from '../../server/modules/designs/service';
import { sampleDocument } from './helpers/fixtures';
import { buildTestApp, CLIENT, type Agent, type TestApp } from './helpers/testApp';

describe('builds: planning, progress and who may see them', () => {
  let t: TestApp;
  let designer: Agent;
  let owner: Agent;
  let builder: Agent;
  let secondBuilder: Agent;
  let builderId: number;
  let secondBuilderId: number;
  let designId: number;

  const tick = (clientId: string, kind: 'cut' | 'kit' | 'step', itemKey: string, done = true, madeAt?: string) => ({ clientId, kind, itemKey, done, ...(madeAt ? { madeAt } : {}) });

  async function newBuild(builderIds: number[]): Promise<number> {
    const response = await designer.post('/api/builds').set(CLIENT).send({ designId, builderIds, dueDate: '2026-12-20', note: 'Use the new saw blade' });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body.build.id as number;
  }

  beforeAll(async () => {
    t = await buildTestApp();
    const designerUser = (await t.db.models.User.findByPk(await t.userId('designer')))!;
    designId = (await createDesignsService(t.db).create(designerUser, sampleDocument('Build base'))).design.id;
    designer = await t.signIn('designer');
    owner = await t.signIn('owner');
    builder = await t.signIn('builder');
    builderId = await t.userId('builder');
    const made = await owner.post('/api/users').set(CLIENT).send({ email: 'second.builder@harborlane.example', displayName: 'Second Builder', role: 'builder', password: 'second-builder-pw' });
    expect(made.status).toBe(201);
    secondBuilderId = made.body.user.id;
    secondBuilder = await t.signInAs('second.builder@harborlane.example', 'second-builder-pw');
  });
  afterAll(() => t.close());

  it('plans a build on the latest revision, in state planned, with the change recorded by who and when', async () => {
    const id = await newBuild([builderId]);
    const { body } = await designer.get(`/api/builds/${id}`);
    expect(body.build).toMatchObject({ designId, revision: 1, state: 'planned', dueDate: '2026-12-20', note: 'Use the new saw blade', builders: [{ id: builderId }] });
    expect(body.stateHistory).toHaveLength(1);
    expect(body.stateHistory[0]).toMatchObject({ fromState: null, toState: 'planned', changedBy: { displayName: 'Tomasz Reyes' } });
    expect(Date.parse(body.stateHistory[0].changedAt)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('refuses to assign people who are not builders, and unknown designs or revisions', async () => {
    const ownerId = await t.userId('owner');
    const notBuilder = await designer.post('/api/builds').set(CLIENT).send({ designId, builderIds: [ownerId] });
    expect(notBuilder.status).toBe(400);
    expect(notBuilder.body.error.fields).toHaveProperty('builderIds');
    expect((await designer.post('/api/builds').set(CLIENT).send({ designId: 99999, builderIds: [builderId] })).status).toBe(400);
    expect((await designer.post('/api/builds').set(CLIENT).send({ designId, revision: 7, builderIds: [builderId] })).body.error.fields).toHaveProperty('revision');
    expect((await designer.post('/api/builds').set(CLIENT).send({ designId, builderIds: [] })).status).toBe(400);
    expect((await designer.post('/api/builds').set(CLIENT).send({ designId, builderIds: [builderId], dueDate: '2026-02-30' })).body.error.fields).toHaveProperty('dueDate');
    expect((await designer.post('/api/builds').set(CLIENT).send({ designId, builderIds: [builderId], extra: 1 })).status).toBe(400);
  });

  it('shows a builder only the builds assigned to them, and answers 403 for any other', async () => {
    const mine = await newBuild([builderId]);
    const theirs = await newBuild([secondBuilderId]);
    const list = await builder.get('/api/builds');
    const ids = (list.body.builds as { id: number }[]).map((build) => build.id);
    expect(ids).toContain(mine);
    expect(ids).not.toContain(theirs);
    expect((await builder.get(`/api/builds/${theirs}`)).status).toBe(403);
    expect((await builder.post(`/api/builds/${theirs}/state`).set(CLIENT).send({ state: 'cutting' })).status).toBe(403);
    const refusedTick = await builder.post(`/api/builds/${theirs}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('aaaaaaaa-1', 'step', 's1')] });
    expect(refusedTick.status).toBe(403);
    expect(refusedTick.body.error.code).toBe('forbidden');
    expect((await builder.get('/api/builds/99999')).status).toBe(404);
  });

  it('lets an assigned builder read the build revision of the design but never save the design', async () => {
    await newBuild([builderId]);
    expect((await builder.get(`/api/designs/${designId}/revisions/1`)).status).toBe(200);
    const save = await builder.post(`/api/designs/${designId}/revisions`).set(CLIENT).send({ baseRevision: 1, document: sampleDocument('Builder edit') });
    expect(save.status).toBe(403);
    expect((await builder.get('/api/designs')).status).toBe(403);
  });

  it('stores ticks with who and when, moves the state forward, and keeps both records when two builders tick the same step', async () => {
    const id = await newBuild([builderId, secondBuilderId]);
    const first = await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('tick-cut-0001', 'cut', 'p1'), tick('tick-cut-0002', 'cut', 'p2')] });
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    expect(first.body.build.state).toBe('cutting');
    expect(first.body.build.progress).toEqual({ cut: 2, kit: 0, step: 0 });

    await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('tick-step-0001', 'step', 'step-1')] });
    const second = await secondBuilder.post(`/api/builds/${id}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('tick-step-0002', 'step', 'step-1')] });
    expect(second.body.build.state).toBe('assembling');
    const stepRecords = (second.body.records as { itemKey: string; madeBy: { id: number } }[]).filter((record) => record.itemKey === 'step-1');
    expect(stepRecords.map((record) => record.madeBy.id).sort()).toEqual([builderId, secondBuilderId].sort());
    expect(second.body.build.progress.step).toBe(1);
    expect(second.body.stateHistory.map((change: { toState: string }) => change.toState)).toEqual(['planned', 'cutting', 'assembling']);
  });

  it('stores a re-sent offline tick once and lets the latest tick of an item win', async () => {
    const id = await newBuild([builderId]);
    const queued = { revision: 1, ticks: [tick('offline-0001', 'kit', 'fastener:M8', true, '2026-12-01T08:00:00.000Z')] };
    expect((await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send(queued)).body.stored).toBe(1);
    const again = await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send(queued);
    expect(again.body.stored).toBe(0);
    expect(again.body.records).toHaveLength(1);
    const untick = await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('offline-0002', 'kit', 'fastener:M8', false, '2026-12-01T08:05:00.000Z')] });
    expect(untick.body.build.progress.kit).toBe(0);
    expect(untick.body.records).toHaveLength(2);
  });

  it('answers a clear notice when ticks were made on a superseded revision, and keeps them with that revision', async () => {
    const id = await newBuild([builderId]);
    const latest = (await designer.get(`/api/designs/${designId}`)).body.revision.number as number;
    const saved = await designer.post(`/api/designs/${designId}/revisions`).set(CLIENT).send({ baseRevision: latest, document: sampleDocument('Build base v2') });
    expect(saved.status).toBe(201);
    const newer = saved.body.revision.number as number;

    const onOld = await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('rev-old-0001', 'step', 'step-1')] });
    expect(onOld.body.notice).toMatchObject({ code: 'newer_design_revision' });
    expect(onOld.body.notice.message).toContain(`revision (${newer})`);

    expect((await designer.patch(`/api/builds/${id}`).set(CLIENT).send({ revision: newer })).status).toBe(200);
    const stale = await builder.post(`/api/builds/${id}/progress`).set(CLIENT).send({ revision: 1, ticks: [tick('rev-old-0002', 'step', 'step-2')] });
    expect(stale.status).toBe(200);
    expect(stale.body.notice).toMatchObject({ code: 'superseded_revision' });
    expect(stale.body.notice.message).toContain(`now follows revision ${newer}`);
    // Progress stays with the revision it was made on: the new revision starts clean.
    expect(stale.body.build.progress).toEqual({ cut: 0, kit: 0, step: 0 });
    expect(stale.body.earlierRevisionRecords).toBe(2);
    // The builder may still read the old revision the ticks were made on.
    expect((await builder.get(`/api/designs/${designId}/revisions/1`)).status).toBe(200);
  });

  it('records every state change a builder or designer makes, by whom', async () => {
    const id = await newBuild([builderId]);
    await builder.post(`/api/builds/${id}/state`).set(CLIENT).send({ state: 'on-hold' });
    const done = await designer.post(`/api/builds/${id}/state`).set(CLIENT).send({ state: 'done' });
    expect(done.body.stateHistory.slice(1).map((change: { toState: string; changedBy: { displayName: string } }) => [change.toState, change.changedBy.displayName])).toEqual([
      ['on-hold', 'Ines Varga'],
      ['done', 'Tomasz Reyes'],
    ]);
    expect((await builder.post(`/api/builds/${id}/state`).set(CLIENT).send({ state: 'finished' })).status).toBe(400);
  });

  it('lists builds of one design for the designer with their progress, open work first by due date', async () => {
    const list = await designer.get(`/api/builds?designId=${designId}`);
    expect(list.status).toBe(200);
    const builds = list.body.builds as { designId: number; state: string; progress: { cut: number } }[];
    expect(builds.length).toBeGreaterThan(3);
    expect(builds.every((build) => build.designId === designId)).toBe(true);
    expect(builds.some((build) => build.progress.cut === 2)).toBe(true);
    const order = ['planned', 'cutting', 'assembling', 'done', 'on-hold'];
    const ranks = builds.map((build) => order.indexOf(build.state));
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
    expect(builds.at(-1)!.state).toBe('done');
    expect((await designer.get('/api/builds?designId=abc')).status).toBe(400);
  });
});
