import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

const CLIENT = { 'X-Slotwise-Client': '1' };

test('a step ticked offline waits on the device and reaches the server when the connection returns', async ({ browser }) => {
  const designerContext = await browser.newContext();
  const designer = await designerContext.newPage();
  await signIn(designer, 'designer');
  const designs = (await (await designer.request.get('/api/designs')).json()).designs as { id: number; name: string }[];
  const enclosure = designs.find((design) => design.name === 'Two-level printer enclosure')!;
  const builders = (await (await designer.request.get('/api/builds/builders')).json()).builders as { id: number; displayName: string }[];
  const builderId = builders.find((person) => person.displayName === 'Ines Varga')!.id;
  const created = await designer.request.post('/api/builds', { headers: CLIENT, data: { designId: enclosure.id, builderIds: [builderId], note: 'Offline spec' } });
  expect(created.status()).toBe(201);
  const buildId = (await created.json()).build.id as number;

  const builderContext = await browser.newContext({ viewport: { width: 1024, height: 768 } });
  const builder = await builderContext.newPage();
  await signIn(builder, 'builder');
  await builder.goto(`/workbench/builds/${buildId}?tab=build`);
  await expect(builder.getByTestId('step-position')).toContainText('Step 1 of 15');
  // Let the service worker finish installing first: going offline during its precache fails the install.
  await builder.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));

  await builderContext.setOffline(true);
  await builder.getByRole('checkbox', { name: 'Step 1 done' }).click();
  const banner = builder.getByTestId('connection-banner');
  await expect(banner).toContainText('Offline');
  await expect(banner).toContainText('1 tick waiting to sync');
  const whileOffline = (await (await designer.request.get(`/api/builds/${buildId}`)).json()).build.progress.step;
  expect(whileOffline).toBe(0);

  // The step pictures need no network: the shared 3D viewer draws them from the revision on the device.
  const canvas = builder.getByTestId('step-canvas');
  const before = await canvas.screenshot();
  await builder.getByRole('button', { name: 'Next step' }).click();
  await expect(builder.getByTestId('step-position')).toContainText('Step 2 of 15');
  expect((await canvas.screenshot()).equals(before)).toBe(false);

  await builderContext.setOffline(false);
  await expect(banner).toBeHidden();
  await expect.poll(async () => (await (await designer.request.get(`/api/builds/${buildId}`)).json()).build.progress.step).toBe(1);
  const records = (await (await designer.request.get(`/api/builds/${buildId}`)).json()).records as { madeBy: { displayName: string }; kind: string }[];
  expect(records).toEqual([expect.objectContaining({ kind: 'step', madeBy: expect.objectContaining({ displayName: 'Ines Varga' }) })]);

  // Kept for offline, the build opens with no network at all, step pictures included.
  await builder.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
  await builder.reload();
  await expect(builder.getByTestId('step-position')).toContainText('Step 2 of 15');
  await expect.poll(() => builder.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
  await builder.getByRole('button', { name: 'Keep for offline' }).click();
  await expect(builder.getByRole('button', { name: 'Kept for offline' })).toBeVisible();
  await builderContext.setOffline(true);
  await builder.reload();
  await expect(builder.getByTestId('step-position')).toContainText('Step 2 of 15', { timeout: 30_000 });
  const offlinePicture = await canvas.screenshot();
  await builder.getByRole('button', { name: 'Next step' }).click();
  await expect(builder.getByTestId('step-position')).toContainText('Step 3 of 15');
  expect((await canvas.screenshot()).equals(offlinePicture)).toBe(false);
  await builderContext.setOffline(false);
  await builderContext.close();
  await designerContext.close();
});
