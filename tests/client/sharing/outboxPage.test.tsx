// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import OutboxPage from '@/features/outbox/components/OutboxPage';
import { makeUser, mockApi, renderAt } from '../testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const me = { status: 200, body: { user: makeUser('owner') } };

describe('outbox page (owner)', () => {
  it('lists the messages the mail catcher received, with their text on opening', async () => {
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/outbox': {
        status: 200,
        body: {
          mode: 'fake',
          messages: [
            { id: 2, from: 'Slotwise <no-reply@slotwise.invalid>', to: ['customer@harborlane.example'], subject: 'Please review Plant rack', text: 'Tomasz Reyes asks you to review Plant rack.', receivedAt: new Date().toISOString() },
            { id: 1, from: 'Slotwise <no-reply@slotwise.invalid>', to: ['student@example.com'], subject: 'A read-only link to Workbench', text: 'Open it here.', receivedAt: new Date().toISOString() },
          ],
        },
      },
    });
    renderAt(<OutboxPage />, '/outbox');
    const list = await screen.findByRole('list', { name: 'Messages' });
    const items = within(list).getAllByTestId('outbox-message');
    expect(items).toHaveLength(2);
    expect(items[0]).toHaveTextContent('Please review Plant rack');
    expect(items[0]).toHaveTextContent('to customer@harborlane.example');
    const text = within(items[0]).getByText('Tomasz Reyes asks you to review Plant rack.');
    expect(text).not.toBeVisible();
    await userEvent.setup().click(within(items[0]).getByText('Please review Plant rack'));
    expect(text).toBeVisible();
  });

  it('says no mail was sent yet when the catcher is empty', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/outbox': { status: 200, body: { mode: 'fake', messages: [] } } });
    renderAt(<OutboxPage />, '/outbox');
    expect(await screen.findByRole('heading', { name: 'No mail sent yet' })).toBeInTheDocument();
    expect(screen.queryByRole('list', { name: 'Messages' })).not.toBeInTheDocument();
  });

  it('points to the mail server when real SMTP is set', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/outbox': { status: 200, body: { mode: 'smtp', messages: [] } } });
    renderAt(<OutboxPage />, '/outbox');
    expect(await screen.findByRole('heading', { name: 'Mail goes to your mail server' })).toBeInTheDocument();
  });
});
