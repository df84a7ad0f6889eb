// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useUnits } from '@/lib/session/useUnits';
import { makeUser, mockApi, renderAt } from './testUtils';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function UnitsProbe() {
  const { units, setUnits } = useUnits();
  return (
    <div>
      <output aria-label="units">{units}</output>
      <button type="button" onClick={() => setUnits('in')}>
        Use inches
      </button>
    </div>
  );
}

describe('useUnits', () => {
  it("reads the signed-in person's saved units", async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: makeUser('designer', { preferences: { units: 'in' } }) } } });
    renderAt(<UnitsProbe />);
    await waitFor(() => expect(screen.getByLabelText('units')).toHaveTextContent('in'));
  });

  it('saves a change as the preference and shows it at once', async () => {
    let saved: unknown = null;
    mockApi({
      'GET /api/auth/me': { status: 200, body: { user: makeUser('designer') } },
      'PATCH /api/auth/me': ({ body }) => {
        saved = body;
        return { status: 200, body: { user: makeUser('designer', { preferences: { units: 'in' } }) } };
      },
    });
    renderAt(<UnitsProbe />);
    await waitFor(() => expect(screen.getByLabelText('units')).toHaveTextContent('mm'));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Use inches' }));
    expect(screen.getByLabelText('units')).toHaveTextContent('in');
    await waitFor(() => expect(saved).toEqual({ preferences: { units: 'in' } }));
  });

  it('goes back to the saved units when the server refuses the change', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: { user: makeUser('designer') } },
      'PATCH /api/auth/me': { status: 500, body: { error: { code: 'internal', message: 'Not saved.' } } },
    });
    renderAt(<UnitsProbe />);
    await waitFor(() => expect(screen.getByLabelText('units')).toHaveTextContent('mm'));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Use inches' }));
    await waitFor(() => expect(screen.getByLabelText('units')).toHaveTextContent('mm'));
  });

  it('falls back to millimetres for an anonymous visitor', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: { user: null } } });
    renderAt(<UnitsProbe />);
    await waitFor(() => expect(screen.getByLabelText('units')).toHaveTextContent('mm'));
  });
});
