/** Query keys for designs, general to specific: invalidate `all` after anything that changes a design. */
export const designKeys = {
  all: ['designs'] as const,
  lists: () => [...designKeys.all, 'list'] as const,
  list: () => [...designKeys.lists()] as const,
  details: () => [...designKeys.all, 'detail'] as const,
  detail: (designId: number) => [...designKeys.details(), designId] as const,
  revisions: (designId: number) => [...designKeys.detail(designId), 'revisions'] as const,
};
