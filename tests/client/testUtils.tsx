import type { ReactElement } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router';
import { vi } from 'vitest';
import type { Role, User } from '@/domain/contracts';
import { createQueryClient } from '@/lib/queryClient';

export interface MockReply {
  status: number;
  body?: unknown;
}
type Handler = (request: { body: unknown; headers: Record<string, string> }) => MockReply;

/**
 * Replaces global fetch with a table of "METHOD /path" handlers. Unlisted requests answer 404 so a
 * test fails loudly instead of hanging. Returns the mock so tests can inspect calls.
 */
export function mockApi(handlers: Record<string, Handler | MockReply>) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === 'string' ? input : input instanceof URL ? input.pathname : input.url;
    const key = `${init?.method ?? 'GET'} ${url}`;
    const handler = handlers[key];
    const request = {
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined,
      headers: (init?.headers ?? {}) as Record<string, string>,
    };
    const reply = handler === undefined ? { status: 404, body: { error: { code: 'not_found', message: `No mock for ${key}` } } } : typeof handler === 'function' ? handler(request) : handler;
    return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
      status: reply.status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

export const DEMO_NAMES: Record<Role, string> = {
  owner: 'Noor Okafor',
  designer: 'Tomasz Reyes',
  builder: 'Ines Varga',
  customer: 'Priya Lindqvist',
  instructor: 'Malik Osei',
};

export function makeUser(role: Role, overrides: Partial<User> = {}): User {
  const ids: Record<Role, number> = { owner: 1, designer: 2, builder: 3, customer: 4, instructor: 5 };
  return {
    id: ids[role],
    email: `${role}@harborlane.example`,
    displayName: DEMO_NAMES[role],
    role,
    active: true,
    preferences: { units: 'mm' },
    createdAt: '2026-01-05T10:00:00.000Z',
    ...overrides,
  };
}

/** Renders routes in a memory router with a fresh QueryClient (retry off), as the TanStack Query guide advises. */
export function renderRoutes(routes: RouteObject[], initialPath: string) {
  const queryClient = createQueryClient({ retry: false });
  const router = createMemoryRouter(routes, { initialEntries: [initialPath] });
  const utils = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...utils, router, queryClient };
}

/** Renders one element at `path` inside the router and query providers. */
export function renderAt(element: ReactElement, path = '/', extraRoutes: RouteObject[] = []) {
  return renderRoutes([{ path, element }, ...extraRoutes], path);
}
