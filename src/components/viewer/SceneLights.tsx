import { useEffect, useMemo, useState } from 'react';
import { ContactShadows } from '@react-three/drei';
import { isSoftwareRenderer } from './softwareRenderer';
import { useThree } from '@react-three/fiber';
import type { DesignDocument } from '@/domain/design/schema';
import { designFootprint } from './footprint';

interface SceneLightsProps {
  /** The design lit; the contact shadow spreads under its footprint (required). */
  design: DesignDocument;
  /** A soft shadow on the floor where the design stands (default true). */
  contactShadow?: boolean;
}

/**
 * Lights only (no environment maps, nothing downloaded): a sky/ground fill, a warm key from the
 * front-left above, a cool rim from behind and a low fill, so slot lips and chambers read as edges;
 * plus a soft contact shadow rendered ONCE per design (not every frame) so the piece stands on the
 * floor instead of floating. The shadow is added just after the first frame: its depth and blur
 * passes and their shaders would otherwise hold back the first picture (seconds on CPU rendering).
 */
export function SceneLights({ design, contactShadow = true }: SceneLightsProps) {
  const afterFirstFrame = useAfterFirstFrame();
  const fp = useMemo(() => designFootprint(design), [design]);
  const width = fp.maxX - fp.minX;
  const depth = fp.maxZ - fp.minZ;
  const span = Math.max(width, depth, 300) * 1.6;
  const height = Math.max(200, highest(design));
  return (
    <>
      <hemisphereLight args={['#f6f8fa', '#7a7f84', 1.35]} />
      <directionalLight position={[2500, 5200, -4200]} intensity={2.8} color="#fff6ec" />
      <directionalLight position={[-4000, 2400, 3500]} intensity={1.3} color="#dbe7f3" />
      <directionalLight position={[3000, -1500, -2500]} intensity={0.35} color="#f2eee6" />
      {contactShadow && afterFirstFrame && (
        <ContactShadows
          // A new design renders a new shadow; otherwise it is drawn once and kept.
          key={`${Math.round(span)}|${Math.round(height)}|${design.profiles.length}|${design.panels.length}`}
          frames={1}
          position={[(fp.minX + fp.maxX) / 2, 0.5, (fp.minZ + fp.maxZ) / 2]}
          scale={span}
          resolution={isSoftwareRenderer() ? 256 : 512}
          far={Math.min(height, 1200)}
          blur={2.2}
          opacity={0.55}
          color="#1d2327"
        />
      )}
    </>
  );
}

/** False until the canvas has drawn its first frame (then a frame is requested for what follows). */
function useAfterFirstFrame(): boolean {
  const [ready, setReady] = useState(false);
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => {
    // Two animation frames: the first frame is drawn in the first, this runs after it.
    let second = 0;
    const first = requestAnimationFrame(() => {
      second = requestAnimationFrame(() => {
        setReady(true);
        invalidate();
      });
    });
    return () => {
      cancelAnimationFrame(first);
      cancelAnimationFrame(second);
    };
  }, [invalidate]);
  return ready;
}

function highest(design: DesignDocument): number {
  let top = 0;
  for (const p of design.profiles) top = Math.max(top, p.start[1], p.start[1] + p.direction[1] * p.length);
  return top;
}
