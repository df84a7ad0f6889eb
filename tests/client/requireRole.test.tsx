// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import { RequireRole } from '@/features/auth/components/RequireRole';
import { makeUser, mockApi, renderRoutes } from './testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const routes = [
  { path: '/sign-in', element: <p>Sign-in page</p> },
  { path: '/people', element: <RequireRole roles={['owner']} />, children: [{ index: true, element: <p>People table</p> }] },
  { path: '/account', element: <RequireRole />, children: [{ index: true, element: <p>Account page</p> }] },
];

describe('RequireRole', () => {
  it('sends an anonymous visitor to sign-in, remembering where they were going', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: null } } });
    const { router } = renderRoutes(routes, '/people?sort=name');

    expect(await screen.findByText('Sign-in page')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe('/people?sort=name');
    expect(screen.queryByText('People table')).not.toBeInTheDocument();
  });

  it('shows a designer that the people page is not available for their role', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: makeUser('designer') } } });
    const { router } = renderRoutes(routes, '/people');

    expect(await screen.findByRole('heading', { name: 'This page is not available for your role' })).toBeInTheDocument();
    expect(screen.queryByText('People table')).not.toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/people');
    expect(screen.getByRole('link', { name: 'Go to your start page' })).toHaveAttribute('href', '/designs');
  });

  it('lets the owner into the people page', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: makeUser('owner') } } });
    renderRoutes(routes, '/people');
    expect(await screen.findByText('People table')).toBeInTheDocument();
  });

  it('lets any signed-in role through when no roles are listed', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: makeUser('customer') } } });
    renderRoutes(routes, '/account');
    expect(await screen.findByText('Account page')).toBeInTheDocument();
  });

  it('offers a retry when the sign-in check itself fails', async () => {
    mockApi({ 'GET /api/auth/me': { status: 500, body: { error: { code: 'internal', message: 'The database is busy.' } } } });
    renderRoutes(routes, '/account');
    expect(await screen.findByText('The database is busy.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
