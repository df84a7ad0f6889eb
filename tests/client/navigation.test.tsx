// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import { AppShell } from '@/app/layout/AppShell';
import type { Role } from '@/domain/contracts';
import { DEMO_NAMES, makeUser, renderAt } from './testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// The contract's client routes: which entries each role's navigation lists.
const EXPECTED: Record<Role, string[]> = {
  owner: ['Designs', 'People', 'Outbox', 'Account'],
  designer: ['Designs', 'Account'],
  builder: ['Workbench', 'Account'],
  customer: ['Reviews', 'Account'],
  instructor: ['Classes', 'Account'],
};

describe('main navigation', () => {
  it.each(Object.entries(EXPECTED) as [Role, string[]][])('shows the %s only their own entries', (role, expected) => {
    renderAt(
      <AppShell user={makeUser(role)}>
        <p>page body</p>
      </AppShell>,
    );
    const nav = screen.getByRole('navigation', { name: 'Main' });
    const labels = within(nav)
      .getAllByRole('link')
      .map((link) => link.textContent?.trim());
    expect(labels).toEqual(expected);
  });

  it('names the signed-in person and their role, and offers sign-out', () => {
    renderAt(
      <AppShell user={makeUser('builder')}>
        <p>page body</p>
      </AppShell>,
    );
    expect(screen.getByText(DEMO_NAMES.builder)).toBeInTheDocument();
    expect(screen.getByText('Builder')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
  });

  it('starts with a skip link that targets the main content', () => {
    renderAt(
      <AppShell user={makeUser('owner')}>
        <p>page body</p>
      </AppShell>,
    );
    const skip = screen.getAllByRole('link')[0];
    expect(skip).toHaveTextContent('Skip to content');
    expect(skip).toHaveAttribute('href', '#main');
    expect(document.getElementById('main')).toContainElement(screen.getByText('page body'));
  });

  it('keeps labelled entries in the compact editor rail', () => {
    renderAt(
      <AppShell user={makeUser('designer')} compact>
        <p>editor</p>
      </AppShell>,
    );
    const nav = screen.getByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Designs' })).toHaveAttribute('href', '/designs');
  });
});
