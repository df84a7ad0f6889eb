import { useEffect, useRef, useState } from 'react';
import { flushSync } from 'react-dom';
import { ScanBox, X } from 'lucide-react';
import type { DesignDocument } from '@/domain/design/schema';
import { Button } from '@/components/ui';
import { exportFileName } from '@/lib/download';
import { arSupported, quickLookSupported } from '@/lib/roomSupport';

interface SeeInRoomProps {
  /** The design to place at true scale (required). */
  design: DesignDocument;
}

/** A small badge drawn as an image: a rel="ar" link must hold a single image. */
const BADGE =
  'data:image/svg+xml;charset=utf-8,' +
  encodeURIComponent(
    '<svg xmlns="http://www.w3.org/2000/svg" width="172" height="36" viewBox="0 0 172 36"><rect width="172" height="36" rx="6" fill="#0b7a75"/><path d="M14 12l8-4 8 4v10l-8 4-8-4z" fill="none" stroke="#fff" stroke-width="2"/><text x="38" y="23" font-family="system-ui,sans-serif" font-size="14" fill="#fff">See it in the room</text></svg>',
  );

/**
 * "See it in the room": where the browser offers a WebXR immersive-ar session, a button that
 * places the piece at true scale on the floor; where links open USDZ in the phone's own AR viewer,
 * a link to the USDZ file. Renders nothing where neither is offered.
 */
export function SeeInRoom({ design }: SeeInRoomProps) {
  const [ar, setAr] = useState(false);
  const [quickLook] = useState(quickLookSupported);
  useEffect(() => {
    let live = true;
    void arSupported().then((supported) => live && setAr(supported));
    return () => {
      live = false;
    };
  }, []);
  return (
    <>
      {ar && <ArSessionButton design={design} />}
      {quickLook && <QuickLookLink design={design} />}
    </>
  );
}

function ArSessionButton({ design }: SeeInRoomProps) {
  const [phase, setPhase] = useState<'idle' | 'starting' | 'active'>('idle');
  const [problem, setProblem] = useState<string | null>(null);
  const overlay = useRef<HTMLDivElement>(null);
  const stop = useRef<(() => void) | null>(null);
  useEffect(() => () => stop.current?.(), []);

  const start = async () => {
    setProblem(null);
    // The overlay must be in the page before the session asks for it.
    flushSync(() => setPhase('starting'));
    try {
      const { startArSession } = await import('@/lib/arSession');
      stop.current = await startArSession(design, overlay.current!, () => {
        stop.current = null;
        setPhase('idle');
      });
      setPhase('active');
    } catch (error) {
      setPhase('idle');
      setProblem(error instanceof Error ? error.message : 'The room view could not start.');
    }
  };

  return (
    <>
      <Button variant="ghost" icon={<ScanBox aria-hidden className="size-4" />} pending={phase === 'starting'} onClick={start} title="Place the piece at true size in your room through the camera">
        See it in the room
      </Button>
      {problem && (
        <span role="alert" className="text-xs text-severity-error">
          {problem}
        </span>
      )}
      <div ref={overlay} className={phase === 'idle' ? 'hidden' : 'fixed inset-x-0 top-0 z-50 flex items-start justify-between gap-2 p-3'}>
        <p className="rounded-md bg-paper-raised/90 px-3 py-2 text-sm text-ink shadow">
          Point at the floor and tap to place the piece at true size. Check the room before building: clearances, floor and walls are yours to judge.
        </p>
        <button type="button" onClick={() => stop.current?.()} className="inline-flex min-h-[44px] min-w-[44px] items-center justify-center rounded-md bg-paper-raised/90 text-ink shadow" aria-label="Leave the room view">
          <X aria-hidden className="size-5" />
        </button>
      </div>
    </>
  );
}

function QuickLookLink({ design }: SeeInRoomProps) {
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    let made: string | null = null;
    void import('@/lib/usdzExport')
      .then(({ designToUsdz }) => designToUsdz(design))
      .then((usdz) => {
        if (!live) return;
        made = URL.createObjectURL(new Blob([usdz as BlobPart], { type: 'model/vnd.usdz+zip' }));
        setUrl(made);
      })
      .catch(() => undefined);
    return () => {
      live = false;
      if (made) URL.revokeObjectURL(made);
    };
  }, [design]);
  if (!url) return null;
  return (
    <a rel="ar" href={url} download={exportFileName(design.name, 'usdz')} className="inline-flex items-center rounded-md focus-ring" data-testid="quick-look-link">
      <img src={BADGE} width={172} height={36} alt="See it in the room" />
    </a>
  );
}
