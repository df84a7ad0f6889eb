/** Query keys for builds; the designs feature uses the same ['builds'] root so either can refresh the other. */
export const buildKeys = {
  all: ['builds'] as const,
  lists: () => [...buildKeys.all, 'list'] as const,
  mine: () => [...buildKeys.lists(), 'mine'] as const,
  detail: (buildId: number) => [...buildKeys.all, 'detail', buildId] as const,
  revision: (designId: number, revision: number) => ['design-revision', designId, revision] as const,
};
