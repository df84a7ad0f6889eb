/**
 * Query keys for builds, general to specific. The one factory for builds: the designs feature
 * (assigning builds, everyone's builds) and the workbench (my builds, one build) both use it, so
 * either side's changes refresh the other.
 */
export const buildKeys = {
  all: ['builds'] as const,
  lists: () => [...buildKeys.all, 'list'] as const,
  /** GET /api/builds as a builder: the builds assigned to me. */
  mine: () => [...buildKeys.lists(), 'mine'] as const,
  /** GET /api/builds as owner or designer: every build in the shop. */
  everyone: () => [...buildKeys.lists(), 'all'] as const,
  /** GET /api/builds/builders */
  builders: () => [...buildKeys.all, 'builders'] as const,
  /** GET /api/builds/:id */
  detail: (buildId: number) => [...buildKeys.all, 'detail', buildId] as const,
};
