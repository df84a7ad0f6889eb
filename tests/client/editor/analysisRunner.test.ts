import { afterEach, describe, expect, it, vi } from 'vitest';
import { startAnalysisRunner } from '@/features/editor/analysis/analysisRunner';
import type { AnalysisRequest, AnalysisResponse } from '@/features/editor/analysis/messages';
import { createEditorStore } from '@/features/editor/store/editorStore';
import { updateProfileCommand } from '@/features/editor/commands/patchCommands';
import { analyzeDesign } from '@/domain/analysis/analyze';
import { twoRailDesign } from './fixtures';

afterEach(() => vi.useRealTimers());

/** A stand-in worker that answers only when the test says so, to control ordering. */
class ManualWorker {
  onmessage: ((event: MessageEvent<AnalysisResponse>) => void) | null = null;
  onerror: ((event: unknown) => void) | null = null;
  requests: AnalysisRequest[] = [];
  terminated = false;
  postMessage(request: AnalysisRequest) {
    this.requests.push(request);
  }
  answer(index: number) {
    const request = this.requests[index];
    this.onmessage?.({ data: { requestId: request.requestId, ok: true, analysis: analyzeDesign(request.design) } } as MessageEvent<AnalysisResponse>);
  }
  terminate() {
    this.terminated = true;
  }
}

describe('live analysis', () => {
  it('runs on the main thread when no worker is available and marks the result ready', () => {
    vi.useFakeTimers();
    const store = createEditorStore({ design: twoRailDesign() });
    const stop = startAnalysisRunner(store, { createWorker: null, debounceMs: 100 });
    vi.advanceTimersByTime(1);
    expect(store.getState().analysisStatus).toBe('ready');
    expect(store.getState().analysis?.cutList).toHaveLength(2);
    expect(store.getState().analysedDesign).toBe(store.getState().design);
    stop();
  });

  it('waits for the edits to pause before analysing again (debounced)', () => {
    vi.useFakeTimers();
    const store = createEditorStore({ design: twoRailDesign() });
    const stop = startAnalysisRunner(store, { createWorker: null, debounceMs: 100 });
    vi.advanceTimersByTime(1);
    store.getState().execute(updateProfileCommand('a', 'p1', { length: 600 }));
    vi.advanceTimersByTime(50);
    store.getState().execute(updateProfileCommand('b', 'p1', { length: 700 }));
    vi.advanceTimersByTime(50);
    expect(store.getState().analysis?.cutList.find((item) => item.id === 'p1')?.length).toBe(500);
    vi.advanceTimersByTime(100);
    expect(store.getState().analysis?.cutList.find((item) => item.id === 'p1')?.length).toBe(700);
    stop();
  });

  it('drops an answer for a design that has since changed and analyses the latest instead', () => {
    vi.useFakeTimers();
    const worker = new ManualWorker();
    const store = createEditorStore({ design: twoRailDesign() });
    const stop = startAnalysisRunner(store, { createWorker: () => worker as unknown as Worker, debounceMs: 10 });
    vi.advanceTimersByTime(1);
    expect(worker.requests).toHaveLength(1);
    store.getState().execute(updateProfileCommand('a', 'p1', { length: 900 }));
    vi.advanceTimersByTime(20);
    // Still one request in flight: the runner never queues a second behind it.
    expect(worker.requests).toHaveLength(1);
    worker.answer(0);
    expect(store.getState().analysis).toBeNull();
    vi.advanceTimersByTime(1);
    expect(worker.requests).toHaveLength(2);
    worker.answer(1);
    expect(store.getState().analysisStatus).toBe('ready');
    expect(store.getState().analysis?.cutList.find((item) => item.id === 'p1')?.length).toBe(900);
    stop();
    expect(worker.terminated).toBe(true);
  });
});
