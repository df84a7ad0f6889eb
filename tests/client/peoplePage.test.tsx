// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import PeoplePage from '@/features/people/components/PeoplePage';
import type { Role, User } from '@/domain/contracts';
import { makeUser, mockApi, renderRoutes } from './testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const roles: Role[] = ['owner', 'designer', 'builder', 'customer', 'instructor'];
const everyone = roles.map((role) => makeUser(role));
const me = { status: 200, body: { user: makeUser('owner') } };

const namesInOrder = () =>
  within(screen.getByRole('table'))
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[0].textContent?.replace('(you)', '').split('@')[0]);

function renderPeople() {
  return renderRoutes([{ path: '/people', element: <PeoplePage /> }], '/people');
}

describe('people page', () => {
  it('lists everyone sorted by name and re-sorts when a header is pressed', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/users': { status: 200, body: { users: everyone } } });
    renderPeople();
    await screen.findByRole('table');
    expect(namesInOrder().map((text) => text?.split(' ')[0])).toEqual(['Ines', 'Malik', 'Noor', 'Priya', 'Tomasz']);

    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: /Name/ }));
    expect(screen.getByRole('columnheader', { name: /Name/ })).toHaveAttribute('aria-sort', 'descending');
    expect(namesInOrder().map((text) => text?.split(' ')[0])).toEqual(['Tomasz', 'Priya', 'Noor', 'Malik', 'Ines']);
  });

  it('does not let the owner change their own role or deactivate themselves', async () => {
    mockApi({ 'GET /api/auth/me': me, 'GET /api/users': { status: 200, body: { users: everyone } } });
    renderPeople();
    expect(await screen.findByLabelText('Role of Noor Okafor')).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Deactivate Noor Okafor' })).not.toBeInTheDocument();
  });

  it('puts a refused role change back and shows the reason beside the select', async () => {
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/users': { status: 200, body: { users: everyone } },
      'PATCH /api/users/3': { status: 400, body: { error: { code: 'validation', message: 'That role cannot be given right now.' } } },
    });
    renderPeople();
    const user = userEvent.setup();
    const select = await screen.findByLabelText('Role of Ines Varga');
    await user.selectOptions(select, 'designer');

    expect(await screen.findByText(/That role cannot be given right now./)).toBeInTheDocument();
    await waitFor(() => expect(screen.getByLabelText('Role of Ines Varga')).toHaveValue('builder'));
  });

  it('deactivates a person only after confirmation', async () => {
    let patched: unknown = null;
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/users': { status: 200, body: { users: everyone } },
      'PATCH /api/users/4': ({ body }) => {
        patched = body;
        return { status: 200, body: { user: { ...makeUser('customer'), active: false } satisfies User } };
      },
    });
    renderPeople();
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Deactivate Priya Lindqvist' }));
    expect(patched).toBeNull();
    await user.click(within(screen.getByRole('alertdialog')).getByRole('button', { name: 'Deactivate' }));

    await waitFor(() => expect(patched).toEqual({ active: false }));
    const row = screen.getByText('customer@harborlane.example').closest('tr')!;
    expect(await within(row).findByText('Deactivated')).toBeInTheDocument();
    expect(within(row).getByRole('button', { name: 'Reactivate Priya Lindqvist' })).toBeInTheDocument();
  });

  it('shows the server’s message beside the email when it is already taken', async () => {
    mockApi({
      'GET /api/auth/me': me,
      'GET /api/users': { status: 200, body: { users: everyone } },
      'POST /api/users': { status: 409, body: { error: { code: 'email_taken', message: 'Someone already signs in with that email.' } } },
    });
    renderPeople();
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Add person' }));
    const dialog = screen.getByRole('dialog', { name: 'Add a person' });
    await user.type(within(dialog).getByLabelText('Name'), 'Ada Brook');
    await user.type(within(dialog).getByLabelText('Email'), 'designer@harborlane.example');
    await user.type(within(dialog).getByLabelText('First password'), 'long-enough-password');
    await user.click(within(dialog).getByRole('button', { name: 'Add person' }));

    expect(await within(dialog).findByText('Someone already signs in with that email.')).toBeInTheDocument();
    expect(within(dialog).getByLabelText('Email')).toHaveAttribute('aria-invalid', 'true');
  });
});
