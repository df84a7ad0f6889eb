// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import { routes } from '@/app/router';
import { makeUser, mockApi, renderRoutes } from './testUtils';

// Stands in for the 3D editor chunk and records whether anything asked for it.
const editorModule = vi.hoisted(() => ({ loaded: 0 }));
vi.mock('@/features/editor/EditorRoute', () => {
  editorModule.loaded += 1;
  return { default: () => <p>Editor stand-in</p> };
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const signedInAs = (role: Parameters<typeof makeUser>[0]) => mockApi({ 'GET /api/auth/me': { status: 200, body: { user: makeUser(role) } } });

describe('the app route table', () => {
  it("sends the builder from / to the workbench and says honestly that nothing is assigned yet", async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: makeUser('builder') } }, 'GET /api/builds': { status: 200, body: { builds: [] } } });
    const { router } = renderRoutes(routes, '/');
    expect(await screen.findByRole('heading', { name: 'No builds assigned to you yet' }, { timeout: 10_000 })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/workbench');
  });

  it('shows a not-found page inside the signed-in frame for an unknown address', async () => {
    signedInAs('customer');
    renderRoutes(routes, '/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Nothing lives at this address' }, { timeout: 10_000 })).toBeInTheDocument();
    expect(within(screen.getByRole('navigation', { name: 'Main' })).getByRole('link', { name: 'Reviews' })).toBeInTheDocument();
  });

  it("keeps the instructor out of the customer's reviews", async () => {
    signedInAs('instructor');
    renderRoutes(routes, '/reviews');
    expect(await screen.findByRole('heading', { name: 'This page is not available for your role' }, { timeout: 10_000 })).toBeInTheDocument();
  });

  it('sends an anonymous visitor of a deep link to sign-in with the way back', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: null } } });
    const { router } = renderRoutes(routes, '/designs/3');
    expect(await screen.findByRole('heading', { name: 'Sign in' }, { timeout: 10_000 })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?next=%2Fdesigns%2F3');
    // The guard runs before the page's code is fetched, so a redirected visitor never downloads the editor.
    expect(editorModule.loaded).toBe(0);
  });

  it('opens the editor page for a designer', async () => {
    signedInAs('designer');
    renderRoutes(routes, '/designs/3');
    expect(await screen.findByText('Editor stand-in', undefined, { timeout: 10_000 })).toBeInTheDocument();
    expect(editorModule.loaded).toBe(1);
  });
});
