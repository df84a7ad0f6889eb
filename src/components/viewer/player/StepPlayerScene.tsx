import { useEffect, useLayoutEffect, useMemo, useRef } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import { useScene } from '../sceneContext';
import type { PlayerView } from './playerTypes';
import { createGhostMaterial, StepAnimator } from './StepAnimator';

interface StepPlayerSceneProps {
  /** What to show: steps, current step, ghosts, explode (required; from useStepPlayer). */
  view: PlayerView;
  /** Called once when the current step's parts have arrived (required; from useStepPlayer). */
  onSettled: (stepIndex: number) => void;
}

/**
 * Inside DesignViewer: animates the drawn instances toward the player's view in the frame loop,
 * writing instance matrices imperatively. Renders on demand: it invalidates only while parts
 * travel or the piece turns, so the canvas is idle between steps.
 */
export function StepPlayerScene({ view, onSettled }: StepPlayerSceneProps) {
  const { drawn, playerProbe } = useScene();
  const invalidate = useThree((s) => s.invalidate);
  const settledRef = useRef(onSettled);
  settledRef.current = onSettled;
  const ghostMaterial = useMemo(() => createGhostMaterial(), []);
  const animator = useMemo(() => new StepAnimator(drawn, ghostMaterial, (i) => settledRef.current(i)), [drawn, ghostMaterial]);
  useEffect(
    () => () => {
      animator.dispose();
      ghostMaterial.dispose();
      invalidate();
    },
    [animator, ghostMaterial, invalidate],
  );

  useLayoutEffect(() => {
    animator.setView(view, performance.now());
    invalidate();
  }, [animator, view, invalidate]);

  useEffect(() => {
    playerProbe.current = () => {
      animator.probeFrame();
    };
    return () => {
      playerProbe.current = null;
    };
  }, [animator, playerProbe]);

  useFrame(() => {
    if (animator.frame(performance.now())) invalidate();
  });
  return null;
}
