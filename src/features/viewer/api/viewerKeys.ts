/** Query keys for the read-only viewer, general to specific. */
export const viewerKeys = {
  all: ['viewer'] as const,
  designs: () => [...viewerKeys.all, 'design'] as const,
  design: (designId: number) => [...viewerKeys.designs(), designId] as const,
};
