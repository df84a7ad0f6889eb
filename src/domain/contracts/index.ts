/**
 * The HTTP contract shared by server and client: zod schemas and their inferred types.
 * The server's presenters return these types; the client's API layer parses answers with these schemas.
 */
export * from './roles';
export * from './units';
export * from './systems';
export * from './users';
export * from './designs';
export * from './builds';
