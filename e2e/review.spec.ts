import { expect, test, type APIRequestContext } from '@playwright/test';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, signIn } from './helpers';

const CLIENT = { 'X-Slotwise-Client': '1' };

/** The fake SMTP server's messages, read through the owner's outbox. */
async function outbox(request: APIRequestContext): Promise<{ to: string[]; subject: string; text: string }[]> {
  const signedIn = await request.post('/api/auth/sign-in', { headers: CLIENT, data: { email: DEMO_ACCOUNTS.owner.email, password: DEMO_PASSWORD } });
  expect(signedIn.ok()).toBe(true);
  return (await (await request.get('/api/outbox')).json()).messages;
}

test('a customer is invited by e-mail, pins a comment and approves; the designer sees both and gets an e-mail about each', async ({ page, browser, playwright, baseURL }) => {
  // Three browser contexts and two 3D views on a shared machine: allow more than the default.
  test.setTimeout(240_000);
  await signIn(page, 'designer');
  const firstCard = page.getByRole('list', { name: 'Designs' }).getByRole('listitem').first();
  const designName = (await firstCard.getByRole('heading').textContent())!.trim();
  await firstCard.getByRole('button', { name: `Share ${designName}` }).click();
  await page.getByLabel("Customer's email").fill(DEMO_ACCOUNTS.customer.email);
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${DEMO_ACCOUNTS.customer.email}`)).toBeVisible();
  await page.getByRole('button', { name: 'Done' }).click();

  const mailReader = await playwright.request.newContext({ baseURL });
  const invitation = (await outbox(mailReader)).find((message) => message.to.includes(DEMO_ACCOUNTS.customer.email) && message.subject.includes('Please review'));
  expect(invitation, 'the invitation e-mail').toBeTruthy();
  const reviewPath = new URL(invitation!.text.match(/https?:\/\/\S+\/reviews\/\d+/)![0]).pathname;

  const customerContext = await browser.newContext();
  const customer = await customerContext.newPage();
  await signIn(customer, 'customer', reviewPath);
  await expect(customer.getByRole('heading', { name: designName })).toBeVisible({ timeout: 60_000 });
  await expect(customer.locator('canvas').first()).toBeVisible({ timeout: 60_000 });
  await customer.getByRole('button', { name: 'Pin to a part' }).click();
  const canvas = (await customer.locator('canvas').first().boundingBox())!;
  // Click across the middle of the view until a part is under the pointer.
  for (const [fx, fy] of [[0.5, 0.5], [0.45, 0.55], [0.55, 0.45], [0.5, 0.65], [0.4, 0.4], [0.6, 0.6], [0.5, 0.35]]) {
    await customer.mouse.click(canvas.x + canvas.width * fx, canvas.y + canvas.height * fy);
    if (await customer.getByRole('button', { name: /Pinned to/ }).count()) break;
  }
  await expect(customer.getByRole('button', { name: /Pinned to/ })).toBeVisible();
  await customer.getByLabel('Comment', { exact: true }).fill('Could this upright move 20 mm inward?');
  await customer.getByRole('button', { name: 'Post comment' }).click();
  await expect(customer.getByTestId('comment').filter({ hasText: '20 mm inward' })).toBeVisible();
  await expect(customer.getByTestId('comment-pin')).toHaveCount(1);
  await customer.getByRole('button', { name: /Approve revision/ }).click();
  await expect(customer.getByTestId('decision-badge')).toContainText('Approved revision');
  await customerContext.close();

  await page.reload();
  await expect(page.getByRole('list', { name: 'Designs' }).getByRole('listitem').first().getByTestId('approval')).toContainText('Approved');
  await page.goto(reviewPath);
  await expect(page.getByTestId('comment').filter({ hasText: '20 mm inward' })).toBeVisible();

  const mail = await outbox(mailReader);
  const toDesigner = mail.filter((message) => message.to.includes(DEMO_ACCOUNTS.designer.email));
  expect(toDesigner.some((message) => message.subject.startsWith('New comment') && message.text.includes('20 mm inward'))).toBe(true);
  expect(toDesigner.some((message) => message.subject.includes('approved'))).toBe(true);
  await mailReader.dispose();
});
