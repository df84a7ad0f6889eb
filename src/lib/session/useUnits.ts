import { useCallback } from 'react';
import { useCurrentUser } from './currentUser';
import type { LengthUnit } from '@/domain/contracts';
import { useUpdateMe } from './updateMe';

export type Units = LengthUnit;

/**
 * The signed-in person's length units ('mm' | 'in'), backed by their saved preferences.
 * setUnits shows the change at once and saves it; a refused save rolls back (see `error`).
 * Without a signed-in person (e.g. a read-only link) units are 'mm' and setUnits does nothing.
 */
export function useUnits(): { units: Units; setUnits: (units: Units) => void; isSaving: boolean; error: Error | null } {
  const { data: user } = useCurrentUser();
  const { mutate, isPending, error } = useUpdateMe();
  const units: Units = user?.preferences.units ?? 'mm';
  const signedIn = Boolean(user);

  const setUnits = useCallback(
    (next: Units) => {
      if (!signedIn || next === units) return;
      mutate({ preferences: { units: next } });
    },
    [mutate, signedIn, units],
  );

  return { units, setUnits, isSaving: isPending, error };
}
