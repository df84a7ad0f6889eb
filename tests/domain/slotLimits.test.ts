import { describe, expect, it } from 'vitest';
import { defaultCatalogue, getSystem } from '@/domain/catalogue';
import { createEmptyDesign } from '@/domain/design/create';
import { panelRectForOpening, type FrameOpening } from '@/domain/design/openings';
import { isThickerThanSlot, panelSlotLimits, SLOT_THICKNESS_CLEARANCE_MM, slotLimitsOf, thickestFittingThickness } from '@/domain/design/slotLimits';

const metric20 = getSystem(defaultCatalogue, 'metric-20')!;
const metric40 = getSystem(defaultCatalogue, 'metric-40')!;

describe('the slot a captured panel sits in', () => {
  it('takes the narrowest opening and shallowest engagement when systems are mixed', () => {
    const limits = slotLimitsOf([metric40, metric20])!;
    expect(limits.slotOpening).toBe(Math.min(metric20.slotOpening, metric40.slotOpening));
    expect(limits.engagement).toBe(Math.min(metric20.slotEngagement, metric40.slotEngagement));
    expect(limits.system.id).toBe(metric20.slotOpening < metric40.slotOpening ? 'metric-20' : 'metric-40');
  });

  it('falls back to the design system when no bounding profile resolves', () => {
    const design = createEmptyDesign({ name: 'Empty', systemId: 'metric-40' });
    expect(panelSlotLimits(design, ['missing'])?.system.id).toBe('metric-40');
  });

  it('refuses sheets that leave less than the one slot clearance (1.5 mm, common practice, no source)', () => {
    const limits = slotLimitsOf([metric40])!;
    expect(SLOT_THICKNESS_CLEARANCE_MM).toBe(1.5);
    expect(isThickerThanSlot(limits.slotOpening - 1.5, limits)).toBe(false);
    expect(isThickerThanSlot(limits.slotOpening - 1.4, limits)).toBe(true);
    expect(isThickerThanSlot(limits.slotOpening, limits)).toBe(true);
  });

  it('picks the thickest listed sheet that fits, the same rule the generators and the editor form use', () => {
    // metric 40: 8 mm opening, so 6.5 mm is the thickest sheet that slides in.
    expect(thickestFittingThickness([3, 4.5, 5, 6, 8, 10], 8)).toBe(6);
    expect(thickestFittingThickness([8, 10], 8)).toBeUndefined();
  });
});

describe('the panel rectangle for an opening', () => {
  const opening: FrameOpening = { id: 'o', boundedBy: ['a', 'b', 'c', 'd'], rect: { center: [0, 500, 0], normal: 'z', width: 560, height: 400 } };

  it('keeps the clear opening for a captured sheet', () => {
    expect(panelRectForOpening(opening, 'captured', 6, 40)).toEqual(opening.rect);
  });

  it('covers the profile faces and sits on them for a face-mounted sheet', () => {
    expect(panelRectForOpening(opening, 'face', 6, 40)).toEqual({ center: [0, 500, 23], normal: 'z', width: 600, height: 440 });
  });
});
