import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { CameraRequest } from '../viewerTypes';
import type { SequenceStep } from '@/domain/assembly';
import type { PlayerView } from './playerTypes';

/** Pause between two steps while playing, ms. */
const DWELL_MS = 450;

export interface StepPlayerState {
  view: PlayerView;
  playing: boolean;
  /** Frames the current step's parts when the step changes (feed to DesignViewer's cameraRequest). */
  cameraRequest: CameraRequest | null;
  play(): void;
  pause(): void;
  togglePlay(): void;
  next(): void;
  previous(): void;
  goTo(stepIndex: number): void;
  setGhostLater(ghost: boolean): void;
  setExplode(explode: number): void;
  /** Called by the scene once a step's travel has ended (drives auto-play). */
  onSettled(stepIndex: number): void;
}

/**
 * The player's state: the current step, playing or not, ghosts, explode. React state changes once
 * per step, never per frame; the scene's StepPlayerScene animates between states. Opens on the
 * finished piece (the last step, settled). `steps` are the assembly core's (e.g.
 * `useMemo(() => sequenceOf(design).steps, [design])`); keep the array stable between renders.
 */
export function useStepPlayer(steps: readonly SequenceStep[]): StepPlayerState {
  const last = Math.max(0, steps.length - 1);
  const [stepIndex, setStepIndex] = useState(last);
  const [playing, setPlaying] = useState(false);
  const [ghostLater, setGhostLater] = useState(true);
  const [explode, setExplode] = useState(0);
  const [replayNonce, setReplayNonce] = useState(0);
  const [cameraRequest, setCameraRequest] = useState<CameraRequest | null>(null);
  const nonce = useRef(0);
  const timer = useRef<number | null>(null);

  useEffect(() => {
    setStepIndex(Math.max(0, steps.length - 1));
    setPlaying(false);
  }, [steps]);
  useEffect(() => () => {
    if (timer.current !== null) window.clearTimeout(timer.current);
  }, []);

  const frameStep = useCallback(
    (index: number) => {
      const step = steps[index];
      if (!step || step.partIds.length === 0) return;
      nonce.current += 1;
      // The piece as built so far, with this step's parts: the new parts are seen in their place.
      const ids = framedPartIds(steps, index);
      setCameraRequest({ ids, nonce: nonce.current });
    },
    [steps],
  );

  const goTo = useCallback(
    (index: number) => {
      const clamped = Math.max(0, Math.min(last, index));
      if (timer.current !== null) window.clearTimeout(timer.current);
      setStepIndex(clamped);
      setReplayNonce((n) => n + 1);
      frameStep(clamped);
    },
    [last, frameStep],
  );

  const playingRef = useRef(playing);
  playingRef.current = playing;
  const indexRef = useRef(stepIndex);
  indexRef.current = stepIndex;

  const onSettled = useCallback(
    (settled: number) => {
      if (!playingRef.current || settled !== indexRef.current) return;
      if (settled >= last) {
        setPlaying(false);
        return;
      }
      timer.current = window.setTimeout(() => {
        if (playingRef.current) goTo(indexRef.current + 1);
      }, DWELL_MS);
    },
    [last, goTo],
  );

  const play = useCallback(() => {
    setPlaying(true);
    // From the finished piece, play starts again at the first step.
    goTo(indexRef.current >= last ? 0 : indexRef.current);
  }, [goTo, last]);
  const pause = useCallback(() => {
    setPlaying(false);
    if (timer.current !== null) window.clearTimeout(timer.current);
  }, []);

  const view = useMemo<PlayerView>(() => ({ steps, stepIndex, ghostLater, explode, replayNonce }), [steps, stepIndex, ghostLater, explode, replayNonce]);

  return {
    view,
    playing,
    cameraRequest,
    play,
    pause,
    togglePlay: () => (playingRef.current ? pause() : play()),
    next: () => {
      pause();
      goTo(indexRef.current + 1);
    },
    previous: () => {
      pause();
      goTo(indexRef.current - 1);
    },
    goTo: (i: number) => {
      pause();
      goTo(i);
    },
    setGhostLater,
    setExplode,
    onSettled,
  };
}

/** The parts a step's camera frames: everything built up to and including step `index`. */
export function framedPartIds(steps: readonly SequenceStep[], index: number): string[] {
  return steps.slice(0, index + 1).flatMap((s) => s.partIds);
}
