import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { defaultCatalogue } from '@/domain/catalogue';
import { generateDesign } from '@/domain/design/generators';
import { removeParts, translateParts, updatePanel, updateProfile } from '@/domain/design/operations';
import { collectIds } from '@/domain/design/references';
import type { DesignDocument } from '@/domain/design/schema';
import { demoDesigns } from '@/domain/fixtures';

/**
 * People read labels ("Lower rail, back") and product names, never the ids the software uses
 * ("p-13", "j-2", "panel-4", "acrylic-6", "machining-end-tap", "m40-40x40").
 */
function internalIds(design: DesignDocument): string[] {
  const catalogue = defaultCatalogue;
  const ids = [
    ...collectIds(design).map((x) => x.id),
    ...[catalogue.systems, catalogue.variants, catalogue.connectors, catalogue.fasteners, catalogue.tNuts, catalogue.panelMaterials, catalogue.accessories].flatMap((list) =>
      (list as { id: string }[]).map((x) => x.id),
    ),
    ...catalogue.panelMaterials.flatMap((m) => m.thicknesses.map((t) => `${m.id}-${t}`)),
    'cut',
    'machining-end-tap',
    'machining-access-counterbore',
    'machining-access-hole',
  ];
  // An id that is an ordinary lower-case word ("plywood") can be a word in a sentence; the ones with a
  // digit or a hyphen ("p-13", "acrylic-6") can only be ids.
  return [...new Set(ids)].filter((id) => /[-\d]/.test(id) && !/^(drop-in|slide-in)$/.test(id));
}

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

function leaks(text: string, ids: string[]): string[] {
  return ids.filter((id) => new RegExp(`(?<![A-Za-z0-9_.-])${escape(id)}(?![A-Za-z0-9_-])`).test(text));
}

function expectNoIds(design: DesignDocument): void {
  const ids = internalIds(design);
  const analysis = analyzeDesign(design, defaultCatalogue, { timings: false });
  for (const finding of analysis.findings) expect(leaks(finding.message, ids), finding.message).toEqual([]);
  for (const line of analysis.cost.lines) {
    expect(leaks(`${line.code} ${line.description}`, ids), `${line.code} ${line.description}`).toEqual([]);
    // Codes are our own part codes, "SW-…", whatever the line is for.
    expect(line.code).toMatch(/^SW-[A-Z0-9_.-]+$/);
  }
  for (const line of analysis.bom) expect(leaks(`${line.code} ${line.description}`, ids), line.description).toEqual([]);
}

/** A frame from a starter, then a few edits that break it so the checks have something to say. */
const brokenFrame = fc
  .record({
    kind: fc.constantFrom('box-frame', 'table', 'shelf-unit', 'cabinet', 'enclosure'),
    systemId: fc.constantFrom('inch-1.5', 'metric-20', 'metric-40'),
    width: fc.integer({ min: 400, max: 2000 }),
    depth: fc.integer({ min: 400, max: 1000 }),
    height: fc.integer({ min: 800, max: 2000 }),
    feet: fc.constantFrom('leveling-foot', 'caster', 'none'),
    edits: fc.array(fc.tuple(fc.constantFrom('remove', 'move', 'shorten', 'thicken'), fc.nat(), fc.integer({ min: -60, max: 60 })), { maxLength: 4 }),
  })
  .map(({ kind, edits, ...params }) => {
    let design = generateDesign(kind, params);
    for (const [edit, pick, amount] of edits) {
      if (edit === 'thicken' && design.panels.length) {
        const panel = design.panels[pick % design.panels.length];
        design = updatePanel(design, panel.id, { thickness: 12 });
        continue;
      }
      if (!design.profiles.length) break;
      const profile = design.profiles[pick % design.profiles.length];
      if (edit === 'remove') design = removeParts(design, [profile.id]);
      else if (edit === 'move') design = translateParts(design, [profile.id], [amount, 0, amount / 2]);
      else design = updateProfile(design, profile.id, { length: Math.max(10, profile.length - Math.abs(amount) - 1) });
    }
    return design;
  });

describe('no internal id reaches a person', () => {
  it('in the findings and price lines of the demo designs', () => {
    for (const design of demoDesigns) expectNoIds(design);
  });

  it('in the findings and price lines of random frames, broken on purpose', () => {
    fc.assert(fc.property(brokenFrame, (design) => expectNoIds(design)), { numRuns: 40 });
  });

  it('would catch one: the matcher finds a part id and a catalogue id in a sentence', () => {
    expect(leaks('Panel panel-4 sits on p-13.', ['panel-4', 'p-13', 'p-1'])).toEqual(['panel-4', 'p-13']);
    expect(leaks('Acrylic, clear 6 mm (acrylic-6)', ['acrylic-6'])).toEqual(['acrylic-6']);
  });
});
