import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import type { AnalysisLimits } from '../../config';
import type { AnalysisTaskResult } from './analysisTask';

/** Analyses documents in worker threads so a heavy design never holds up other requests. */
export interface AnalysisPool {
  /** Resolves with the task's result; rejects with `AnalysisTimeout` past the time limit, `AnalysisBusy` when the queue is full. */
  /** `body` is the request's JSON text: the worker parses and checks it, not the request thread. */
  run(body: string, maxParts: number, cancel?: AbortSignal): Promise<AnalysisTaskResult>;
  close(): Promise<void>;
}

export class AnalysisTimeout extends Error {
  constructor(readonly limitMs: number) {
    super(`The analysis took longer than ${limitMs} ms`);
    this.name = 'AnalysisTimeout';
  }
}

export class AnalysisBusy extends Error {
  constructor() {
    super('Every analysis worker is busy and the queue is full');
    this.name = 'AnalysisBusy';
  }
}

/** A piscina pool, started on first use; a task past the time limit is aborted and its thread replaced. */
export function createAnalysisPool(limits: AnalysisLimits): AnalysisPool {
  let pool: Piscina | undefined;
  const start = () =>
    (pool ??= new Piscina({
      filename: new URL('./analysisWorker.mjs', import.meta.url).href,
      minThreads: 1,
      maxThreads: limits.threads,
      idleTimeout: 60_000,
      maxQueue: limits.threads * 64,
    }));
  return {
    async run(body, maxParts, cancel) {
      // The clock starts when a thread picks the task up: waiting in the queue or for a new thread
      // to load is not the design's fault.
      const abort = new AbortController();
      // A request whose client went away marks its task: the worker skips it when its turn comes,
      // or between the parse and the analysis. Aborting through piscina would end the thread if the
      // task had just been handed to it, and a new thread costs seconds to load.
      const cancelled = new Int32Array(new SharedArrayBuffer(4));
      const onCancel = () => Atomics.store(cancelled, 0, 1);
      cancel?.addEventListener('abort', onCancel, { once: true });
      let timedOut = false;
      const { port1, port2 } = new MessageChannel();
      let timer: NodeJS.Timeout | undefined;
      port1.once('message', () => {
        timer = setTimeout(() => {
          timedOut = true;
          abort.abort();
        }, limits.timeLimitMs);
        port1.close();
      });
      try {
        return (await start().run({ body, maxParts, cancelled, started: port2 }, { signal: abort.signal, transferList: [port2] })) as AnalysisTaskResult;
      } catch (error) {
        if (timedOut) throw new AnalysisTimeout(limits.timeLimitMs);
        if (/queue is at limit/i.test(String((error as Error)?.message))) throw new AnalysisBusy();
        throw error;
      } finally {
        clearTimeout(timer);
        cancel?.removeEventListener('abort', onCancel);
        port1.close();
      }
    },
    async close() {
      const running = pool;
      pool = undefined;
      await running?.destroy();
    },
  };
}
