/** Query keys for the editor, general to specific. */
export const editorKeys = {
  all: ['editor'] as const,
  designs: () => [...editorKeys.all, 'design'] as const,
  design: (designId: number) => [...editorKeys.designs(), designId] as const,
};
