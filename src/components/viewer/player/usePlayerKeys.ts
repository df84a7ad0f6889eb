import { useEffect } from 'react';
import type { StepPlayerState } from './useStepPlayer';

/** Arrow keys step, space plays or pauses — unless the person is typing in a field. */
export function usePlayerKeys(player: StepPlayerState): void {
  const { next, previous, togglePlay } = player;
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      const tag = target?.tagName;
      if (e.altKey || e.ctrlKey || e.metaKey) return;
      if (tag === 'TEXTAREA' || tag === 'SELECT' || (tag === 'INPUT' && (target as HTMLInputElement).type !== 'checkbox')) return;
      if (target?.isContentEditable) return;
      if (e.key === 'ArrowRight') {
        e.preventDefault();
        next();
      } else if (e.key === 'ArrowLeft') {
        e.preventDefault();
        previous();
      } else if (e.key === ' ') {
        e.preventDefault();
        togglePlay();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [next, previous, togglePlay]);
}
