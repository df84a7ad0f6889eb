import { describe, expect, it } from 'vitest';
import { generateDesign } from '@/domain/design/generators';
import { parseDesignDocument } from '@/domain/design/parse';
import { insertDesignCommand } from '@/features/editor/commands/insertDesignCommand';
import { generatorFields, generatorFormSchema } from '@/features/editor/dialogs/generatorFields';
import { boxFrameGenerator } from '@/domain/design/generators';
import { createEditorStore } from '@/features/editor/store/editorStore';

describe('frame starters', () => {
  it('adding a generated frame beside the current one renames every clashing id and keeps references valid', () => {
    const frame = generateDesign('box-frame', boxFrameGenerator.defaults);
    const store = createEditorStore({ design: frame });
    const before = store.getState().design;
    store.getState().execute(insertDesignCommand('Add a box frame', frame));
    const merged = store.getState().design;
    expect(merged.profiles).toHaveLength(frame.profiles.length * 2);
    expect(new Set(merged.profiles.map((p) => p.id)).size).toBe(merged.profiles.length);
    // The domain's parser checks unique ids and that every reference points at an existing part.
    expect(parseDesignDocument(merged).ok).toBe(true);
    // Placed beside the first frame along +X, not on top of it.
    const firstMaxX = Math.max(...frame.profiles.map((p) => p.start[0] + p.direction[0] * p.length));
    const addedMinX = Math.min(...merged.profiles.slice(frame.profiles.length).map((p) => Math.min(p.start[0], p.start[0] + p.direction[0] * p.length)));
    expect(addedMinX).toBeGreaterThan(firstMaxX);
    store.getState().undo();
    expect(store.getState().design).toBe(before);
  });

  it('reads sizes typed in inches and puts the generator’s own refusals beside the field', () => {
    const fields = generatorFields(boxFrameGenerator);
    const schema = generatorFormSchema(boxFrameGenerator, fields, 'in');
    const ok = schema.safeParse({ systemId: 'inch-1.5', width: '36', depth: '24', height: '30-1/2', feet: 'leveling-foot', panels: 'none', panelMaterialId: 'acrylic' });
    expect(ok.success).toBe(true);
    // 30 1/2 in = 774.7 mm (25.4 mm per inch, exact by definition).
    expect((ok.data as { height: number }).height).toBeCloseTo(774.7, 9);
    const tooSmall = schema.safeParse({ systemId: 'inch-1.5', width: '2', depth: 'x', height: '30', feet: 'leveling-foot', panels: 'none', panelMaterialId: 'acrylic' });
    expect(tooSmall.success).toBe(false);
    const paths = tooSmall.error!.issues.map((issue) => issue.path.join('.'));
    expect(paths).toContain('depth');
  });
});
