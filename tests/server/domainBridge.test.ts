import { describe, expect, it } from 'vitest';
import { checkDesignDocument, loadDemoDesigns } from '../../server/domainBridge';

describe('the server loads the demo designs explicitly', () => {
  it('returns the three designs of the domain fixtures, each a valid document with its parts', async () => {
    const designs = await loadDemoDesigns();
    expect(designs.map((d) => d.name)).toEqual(['Two-level printer enclosure', 'Standing workbench', 'Plant rack']);
    for (const design of designs) {
      expect(checkDesignDocument(design).ok).toBe(true);
      // Real fixtures, not empty stand-ins of the same name.
      expect(design.profiles.length).toBeGreaterThan(4);
    }
  });

  it('returns the same parsed documents on every call', async () => {
    expect(await loadDemoDesigns()).toBe(await loadDemoDesigns());
  });
});
