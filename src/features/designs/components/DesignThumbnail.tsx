import { useState } from 'react';

/** The design's saved picture, or a drawn frame outline when it has none yet (or the picture fails to load). */
export function DesignThumbnail({ url, name }: { url: string | null; name: string }) {
  const [failed, setFailed] = useState(false);
  if (url && !failed) {
    return <img src={url} alt={`Picture of ${name}`} loading="lazy" onError={() => setFailed(true)} className="h-full w-full object-contain" />;
  }
  return <FramePlaceholder />;
}

function FramePlaceholder() {
  // A box frame in isometric view, drawn in the profile metal colour.
  const p = (x: number, y: number, z: number) => `${100 + (x - z) * 34},${80 + (x + z) * 19 - y * 38}`;
  const edges: [number, number, number, number, number, number][] = [
    [0, 0, 0, 2, 0, 0], [2, 0, 0, 2, 0, 1.4], [2, 0, 1.4, 0, 0, 1.4], [0, 0, 1.4, 0, 0, 0],
    [0, 1.6, 0, 2, 1.6, 0], [2, 1.6, 0, 2, 1.6, 1.4], [2, 1.6, 1.4, 0, 1.6, 1.4], [0, 1.6, 1.4, 0, 1.6, 0],
    [0, 0, 0, 0, 1.6, 0], [2, 0, 0, 2, 1.6, 0], [2, 0, 1.4, 2, 1.6, 1.4], [0, 0, 1.4, 0, 1.6, 1.4],
  ];
  return (
    <svg viewBox="0 0 200 150" role="img" aria-label="No picture saved yet" className="h-full w-full">
      <title>No picture saved yet</title>
      {edges.map(([x1, y1, z1, x2, y2, z2], index) => {
        const [ax, ay] = p(x1, y1, z1).split(',');
        const [bx, by] = p(x2, y2, z2).split(',');
        return <line key={index} x1={ax} y1={ay} x2={bx} y2={by} stroke="#b9c0c6" strokeWidth={6} strokeLinecap="square" />;
      })}
    </svg>
  );
}
