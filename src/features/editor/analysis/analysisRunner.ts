import { analyzeDesign } from '@/domain/analysis/analyze';
import { DEFAULT_ANALYSIS_TIME_LIMIT_MS } from '@/domain/checks/findingCap';
import type { DesignDocument } from '@/domain/design/schema';
import type { EditorStoreApi } from '../store/types';
import type { AnalysisRequest, AnalysisResponse } from './messages';

export const ANALYSIS_DEBOUNCE_MS = 150;

type WorkerFactory = () => Worker;

export interface AnalysisRunnerOptions {
  debounceMs?: number;
  /** How to start the worker; `null` forces the main thread (tests, or no Worker support). */
  createWorker?: WorkerFactory | null;
  /** A worker still busy after this long is stopped and the analysis reported failed, ms (the server's default). */
  timeLimitMs?: number;
}

const defaultWorkerFactory: WorkerFactory = () =>
  new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module' });

/**
 * Keeps `store.analysis` in step with `store.design`: debounced, one request in flight, and
 * latest wins (an answer for a design that has since changed is dropped and the newest is sent).
 * Uses a Web Worker when available, else the main thread after the debounce.
 * Returns a stop function.
 */
export function startAnalysisRunner(store: EditorStoreApi, options: AnalysisRunnerOptions = {}): () => void {
  const debounceMs = options.debounceMs ?? ANALYSIS_DEBOUNCE_MS;
  const timeLimitMs = options.timeLimitMs ?? DEFAULT_ANALYSIS_TIME_LIMIT_MS * 2;
  let deadline: ReturnType<typeof setTimeout> | null = null;
  const clearDeadline = () => {
    if (deadline) clearTimeout(deadline);
    deadline = null;
  };
  const factory = options.createWorker === undefined ? (typeof Worker === 'undefined' ? null : defaultWorkerFactory) : options.createWorker;

  let worker: Worker | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  let nextRequestId = 0;
  let inFlight: { requestId: number; design: DesignDocument } | null = null;
  let stopped = false;

  const wanted = () => store.getState().design;

  const finish = (design: DesignDocument, response: AnalysisResponse) => {
    if (stopped) return;
    if (design !== wanted()) {
      // Latest wins: the design moved on while this ran.
      schedule(0);
      return;
    }
    if (response.ok) store.getState().setAnalysisResult(design, response.analysis);
    else {
      if (import.meta.env?.DEV) console.error('Analysis failed:', response.message);
      store.getState().setAnalysisFailed();
    }
  };

  const runOnMainThread = (design: DesignDocument, requestId: number) => {
    let response: AnalysisResponse;
    try {
      response = { requestId, ok: true, analysis: analyzeDesign(design) };
    } catch (error) {
      response = { requestId, ok: false, message: error instanceof Error ? error.message : String(error) };
    }
    finish(design, response);
  };

  const startWorker = (): Worker | null => {
    if (worker || !factory) return worker;
    try {
      worker = factory();
    } catch {
      worker = null;
      return null;
    }
    worker.onmessage = (event: MessageEvent<AnalysisResponse>) => {
      const request = inFlight;
      if (!request || request.requestId !== event.data.requestId) return;
      clearDeadline();
      inFlight = null;
      finish(request.design, event.data);
    };
    worker.onerror = () => {
      // The worker could not start or crashed: finish this and later requests on the main thread.
      clearDeadline();
      const request = inFlight;
      inFlight = null;
      worker?.terminate();
      worker = null;
      fallbackToMainThread = true;
      if (request) runOnMainThread(request.design, request.requestId);
    };
    return worker;
  };

  let fallbackToMainThread = !factory;

  const send = () => {
    timer = null;
    if (stopped || inFlight) return;
    const design = wanted();
    if (store.getState().analysedDesign === design && store.getState().analysisStatus === 'ready') return;
    const requestId = ++nextRequestId;
    store.getState().setAnalysisRunning();
    const target = fallbackToMainThread ? null : startWorker();
    if (!target) {
      runOnMainThread(design, requestId);
      return;
    }
    inFlight = { requestId, design };
    const message: AnalysisRequest = { requestId, design };
    target.postMessage(message);
    // Past the time limit the worker is stopped (never retried on the main thread, which would freeze the tab).
    clearDeadline();
    deadline = setTimeout(() => {
      deadline = null;
      if (!inFlight || inFlight.requestId !== requestId) return;
      inFlight = null;
      worker?.terminate();
      worker = null;
      if (!stopped) store.getState().setAnalysisFailed();
      if (!stopped && design !== wanted()) schedule(0);
    }, timeLimitMs);
  };

  function schedule(delay: number) {
    if (stopped) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(send, delay);
  }

  const unsubscribe = store.subscribe((state, previous) => {
    if (state.design !== previous.design) schedule(debounceMs);
  });
  schedule(0);

  return () => {
    stopped = true;
    unsubscribe();
    if (timer) clearTimeout(timer);
    clearDeadline();
    worker?.terminate();
    worker = null;
  };
}
