// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { vi } from 'vitest';
import SignInPage from '@/features/auth/components/SignInPage';
import { makeUser, mockApi, renderRoutes } from './testUtils';

/** The server's answer to GET /api/auth/me without a session. */
const anonymous = { status: 200, body: { user: null } };

function renderSignIn(path = '/sign-in') {
  return renderRoutes(
    [
      { path: '/sign-in', element: <SignInPage /> },
      { path: '/designs', element: <p>Designs list</p> },
      { path: '/people', element: <p>People list</p> },
      { path: '/workbench', element: <p>Workbench page</p> },
    ],
    path,
  );
}

async function fillAndSubmit(email: string, password: string) {
  const user = userEvent.setup();
  const submit = await screen.findByRole('button', { name: 'Sign in' });
  if (email) await user.type(screen.getByLabelText('Email'), email);
  if (password) await user.type(screen.getByLabelText('Password'), password);
  await user.click(submit);
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('sign-in form', () => {
  it('shows a message beside each empty field and sends nothing to the server', async () => {
    const fetchMock = mockApi({ 'GET /api/auth/me': anonymous });
    renderSignIn();
    await fillAndSubmit('', '');

    expect(await screen.findByText('Enter your email address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(screen.getByLabelText('Email')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('Email')).toHaveAccessibleDescription(/Enter your email address/);
    expect(fetchMock.mock.calls.some(([url]) => String(url).includes('sign-in'))).toBe(false);
  });

  it('asks for a real email address before sending', async () => {
    mockApi({ 'GET /api/auth/me': anonymous });
    renderSignIn();
    await fillAndSubmit('not-an-email', 'whatever');
    expect(await screen.findByText('Enter an email address like name@example.com.')).toBeInTheDocument();
  });

  it("shows the server's generic message when the email and password do not match", async () => {
    const message = 'That email and password do not match an active account.';
    mockApi({
      'GET /api/auth/me': anonymous,
      'POST /api/auth/sign-in': { status: 401, body: { error: { code: 'invalid_credentials', message } } },
    });
    renderSignIn();
    await fillAndSubmit('designer@harborlane.example', 'wrong-password');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent(message);
    expect(screen.getByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
  });

  it('tells the person to wait when sign-in is rate limited', async () => {
    mockApi({
      'GET /api/auth/me': anonymous,
      'POST /api/auth/sign-in': { status: 429, body: { error: { code: 'rate_limited', message: 'Too many sign-in attempts. Try again in 10 minutes.' } } },
    });
    renderSignIn();
    await fillAndSubmit('designer@harborlane.example', 'guess');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Too many attempts');
    expect(alert).toHaveTextContent('Try again in 10 minutes.');
  });

  it("puts the server's field messages beside the matching fields", async () => {
    mockApi({
      'GET /api/auth/me': anonymous,
      'POST /api/auth/sign-in': { status: 400, body: { error: { code: 'validation', message: 'Check the form.', fields: { email: 'An email address is at most 254 characters' } } } },
    });
    renderSignIn();
    await fillAndSubmit('designer@harborlane.example', 'secret');
    expect(await screen.findByText('An email address is at most 254 characters')).toBeInTheDocument();
    expect(screen.getByLabelText('Email')).toHaveAttribute('aria-invalid', 'true');
  });

  it('sends the header the server requires and opens the page named in next', async () => {
    const fetchMock = mockApi({
      'GET /api/auth/me': anonymous,
      'POST /api/auth/sign-in': ({ headers }) =>
        headers['X-Slotwise-Client'] === '1' ? { status: 200, body: { user: makeUser('owner') } } : { status: 403, body: { error: { code: 'csrf', message: 'Missing header' } } },
    });
    const { router } = renderSignIn('/sign-in?next=%2Fpeople');
    await fillAndSubmit('owner@harborlane.example', 'slotwise-demo-2026');

    expect(await screen.findByText('People list')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/people');
    const signInCall = fetchMock.mock.calls.find(([url]) => url === '/api/auth/sign-in');
    expect(JSON.parse(String(signInCall?.[1]?.body))).toEqual({ email: 'owner@harborlane.example', password: 'slotwise-demo-2026' });
  });

  it("ignores a next address on another site and opens the role's start page", async () => {
    mockApi({ 'GET /api/auth/me': anonymous, 'POST /api/auth/sign-in': { status: 200, body: { user: makeUser('builder') } } });
    const { router } = renderSignIn('/sign-in?next=%2F%2Fevil.example%2Fsteal');
    await fillAndSubmit('builder@harborlane.example', 'slotwise-demo-2026');
    await waitFor(() => expect(router.state.location.pathname).toBe('/workbench'));
  });
});
