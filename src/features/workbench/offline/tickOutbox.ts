import { postProgress } from '../api/postProgress';
import { createOutbox, idbOutboxStorage } from './outbox';

/** The page's one outbox, kept in IndexedDB. */
export const tickOutbox = createOutbox(idbOutboxStorage, postProgress);
