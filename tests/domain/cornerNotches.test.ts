import { describe, expect, it } from 'vitest';
import { cornerNotches, type CornerJoint } from '@/domain/geometry/cornerNotches';

// Four frame profiles of a captured panel; the connector lengths are made-up inputs, not catalogue data.
const FRAME = new Set(['top', 'bottom', 'left', 'right']);
const corner = (id: string, a: string, b: string, occupiedSlotLength: number | undefined, kind = 'corner-bracket'): CornerJoint => ({
  id,
  kind,
  memberIds: [a, b],
  occupiedSlotLength,
});

describe('corner notches of a captured panel', () => {
  it('notches every frame corner where a bracket sits in the slot, as long as the longest bracket', () => {
    const notches = cornerNotches(FRAME, [
      corner('j4', 'right', 'top', 30),
      corner('j1', 'top', 'left', 36),
      corner('j2', 'left', 'bottom', 36),
      corner('j3', 'bottom', 'right', 12.34),
    ]);
    expect(notches).toEqual({ size: 36, corners: 4, jointIds: ['j1', 'j2', 'j3', 'j4'] });
  });

  it('counts a joint once although both of its profiles list it', () => {
    const j = corner('j1', 'top', 'left', 20);
    expect(cornerNotches(FRAME, [j, j])).toEqual({ size: 20, corners: 1, jointIds: ['j1'] });
  });

  it('needs no notch for joints off the frame, connectors outside the slot or unknown connectors', () => {
    const notches = cornerNotches(FRAME, [
      corner('off-frame', 'top', 'shelf', 36),
      corner('gusset', 'top', 'left', 36, 'gusset-plate'),
      corner('unknown', 'left', 'bottom', undefined),
      corner('flat', 'bottom', 'right', 0),
    ]);
    expect(notches).toEqual({ size: 0, corners: 0, jointIds: [] });
  });

  it('rounds the notch to 0.1 mm and never counts more than four corners', () => {
    const many = ['a', 'b', 'c', 'd', 'e'].map((id) => corner(id, 'top', 'left', 17.26, 'concealed-connector'));
    expect(cornerNotches(FRAME, many)).toMatchObject({ size: 17.3, corners: 4 });
  });
});
