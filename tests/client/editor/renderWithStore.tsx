import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import type { DesignDocument } from '@/domain/design/schema';
import type { LengthUnit } from '@/domain/units';
import { createEditorStore, EditorStoreProvider } from '@/features/editor/store/editorStore';

/** Renders `ui` inside a fresh editor store loaded with `design`, and hands back the store. */
export function renderWithStore(ui: ReactElement, design: DesignDocument, units: LengthUnit = 'mm') {
  const store = createEditorStore();
  store.getState().loadDesign(design, { designId: 1, revision: 1 });
  store.getState().setUnits(units);
  const utils = render(<EditorStoreProvider store={store}>{ui}</EditorStoreProvider>);
  return { store, ...utils };
}
