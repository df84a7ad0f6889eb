/** The client's query key factories: one per resource, shared by every feature that caches it. */
export { designKeys } from './designKeys';
export { buildKeys } from './buildKeys';
export { authKeys } from '../session/authKeys';
