import { useEffect, useRef } from 'react';
import type { DesignDocument } from '@/domain/design/schema';
import type { InstructionStep } from '@/domain/buildInstructions';
import { drawStepPicture } from '../picture/drawStep';

/** The step's picture, redrawn for the element's size and the device's pixel ratio. */
export function StepCanvas({ design, steps, index }: { design: DesignDocument; steps: InstructionStep[]; index: number }) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const step = steps[index];
    const draw = () => {
      const ratio = Math.min(2, window.devicePixelRatio || 1);
      const width = Math.max(1, Math.round(canvas.clientWidth * ratio));
      const height = Math.max(1, Math.round(canvas.clientHeight * ratio));
      canvas.width = width;
      canvas.height = height;
      const ctx = canvas.getContext('2d');
      if (!ctx || !step) return;
      const donePartIds = new Set(steps.slice(0, index).flatMap((earlier) => earlier.partIds));
      drawStepPicture(ctx, width, height, { design, donePartIds, stepPartIds: new Set(step.partIds), insertionDirection: step.insertionDirection });
    };
    draw();
    const observer = new ResizeObserver(draw);
    observer.observe(canvas);
    return () => observer.disconnect();
  }, [design, steps, index]);
  return (
    <canvas
      ref={canvasRef}
      data-testid="step-canvas"
      role="img"
      aria-label={steps[index] ? `Step ${steps[index].number}: ${steps[index].title}. Earlier parts grey, this step's parts orange, shown pulled out along the way they go in.` : 'No step'}
      className="h-full w-full touch-pan-y rounded-card border border-paper-line"
    />
  );
}
