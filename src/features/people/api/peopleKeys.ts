/** Query keys for the shop's accounts (owner only), general to specific. */
export const peopleKeys = {
  all: ['people'] as const,
  list: () => [...peopleKeys.all, 'list'] as const,
};
