// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import ClassesPage from '@/features/classes/components/ClassesPage';
import type { ClassView } from '@/features/classes/api/schemas';
import { makeUser, mockApi, renderAt } from '../testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const me = { status: 200, body: { user: makeUser('instructor') } };

function classView(overrides: Partial<ClassView> = {}): ClassView {
  return {
    id: 3,
    name: 'Frames 101',
    description: 'Week 3: enclosures',
    expiresAt: null,
    revokedAt: null,
    createdAt: '2026-11-30T10:00:00.000Z',
    active: true,
    openCount: 7,
    links: [
      { id: 9, designId: 1, designName: 'Two-level printer enclosure', revision: null, label: 'Frames 101', expiresAt: null, revokedAt: null, openCount: 7, classId: 3, createdAt: '2026-11-30T10:05:00.000Z', active: true },
    ],
    ...overrides,
  };
}

describe('classes page (instructor)', () => {
  it('lists each class with its links, open counts and state', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/classes': { status: 200, body: { classes: [classView()] } } });
    renderAt(<ClassesPage />, '/classes');
    const item = await screen.findByTestId('class-3');
    expect(within(item).getByRole('heading', { name: 'Frames 101' })).toBeInTheDocument();
    expect(item).toHaveTextContent('Active · 1 link · opened 7 times');
    const row = within(item).getAllByRole('row')[1];
    expect(row).toHaveTextContent('Two-level printer enclosure');
    expect(row).toHaveTextContent('latest');
    expect(row).toHaveTextContent('works');
  });

  it('offers to make the first class when there are none', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/classes': { status: 200, body: { classes: [] } } });
    renderAt(<ClassesPage />, '/classes');
    expect(await screen.findByRole('heading', { name: 'No classes yet' })).toBeInTheDocument();
  });

  it('refuses an empty name in the form without asking the server', async () => {
    const fetchMock = mockApi({ 'GET /api/auth/me': me, 'GET /api/classes': { status: 200, body: { classes: [] } } });
    renderAt(<ClassesPage />, '/classes');
    const user = userEvent.setup();
    await user.click((await screen.findAllByRole('button', { name: 'New class' }))[0]);
    const dialog = screen.getByRole('dialog', { name: 'New class' });
    expect(within(dialog).getByLabelText('Name')).toBeRequired();
    await user.click(within(dialog).getByRole('button', { name: 'Create class' }));
    expect(within(dialog).getByLabelText('Name')).toBeInvalid();
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);
  });

  it("shows the server's message beside the name when it refuses the class", async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': me,
      'GET /api/classes': { status: 200, body: { classes: [] } },
      'POST /api/classes': { status: 400, body: { error: { code: 'validation_failed', message: 'Check the highlighted fields.', fields: { name: 'Enter a name for the class' } } } },
    });
    renderAt(<ClassesPage />, '/classes');
    const user = userEvent.setup();
    await user.click((await screen.findAllByRole('button', { name: 'New class' }))[0]);
    const dialog = screen.getByRole('dialog', { name: 'New class' });
    await user.type(within(dialog).getByLabelText('Name'), '   ');
    await user.click(within(dialog).getByRole('button', { name: 'Create class' }));
    const name = within(dialog).getByLabelText('Name');
    await waitFor(() => expect(name).toHaveAttribute('aria-invalid', 'true'));
    expect(name).toHaveAccessibleDescription(/Enter a name for the class/);
    expect(fetchMock).toHaveBeenCalledWith('/api/classes', expect.objectContaining({ method: 'POST' }));
  });

  it('revokes a class after confirming', async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': me,
      'GET /api/classes': { status: 200, body: { classes: [classView()] } },
      'DELETE /api/classes/3': { status: 200, body: { class: classView({ active: false, revokedAt: '2026-12-01T09:00:00.000Z' }) } },
    });
    renderAt(<ClassesPage />, '/classes');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Revoke class' }));
    const confirm = screen.getByRole('alertdialog');
    expect(confirm).toHaveTextContent('Every link in this class stops working at once');
    await user.click(within(confirm).getByRole('button', { name: 'Revoke class' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledWith('/api/classes/3', expect.objectContaining({ method: 'DELETE' })));
  });
});
