// Entry of an analysis worker thread (piscina). The task is TypeScript, so it is loaded through
// tsx's namespaced loader, which works whether or not the parent process runs under tsx.
import { register } from 'tsx/esm/api';

const api = register({ namespace: 'slotwise-analysis-worker' });
const task = await api.import('./analysisTask.ts', import.meta.url);

export default task.default ?? task;
