/** A line drawing of a small T-slot frame in isometric view: decoration for the sign-in page, hidden from screen readers. */
export function FrameSketch({ className }: { className?: string }) {
  // Isometric projection of a 3 x 2 x 2 box: x to the lower right, z to the lower left, y up.
  const project = (x: number, y: number, z: number) => [200 + (x - z) * 52, 210 + (x + z) * 30 - y * 60] as const;
  const corners = [0, 1].flatMap((y) => [
    [0, y * 2, 0],
    [3, y * 2, 0],
    [3, y * 2, 2],
    [0, y * 2, 2],
  ]) as [number, number, number][];
  const edges: [number, number][] = [
    [0, 1], [1, 2], [2, 3], [3, 0],
    [4, 5], [5, 6], [6, 7], [7, 4],
    [0, 4], [1, 5], [2, 6], [3, 7],
  ];
  const shelf = [[0, 0.9, 0], [3, 0.9, 0], [3, 0.9, 2], [0, 0.9, 2]].map(([x, y, z]) => project(x, y, z));
  return (
    <svg viewBox="40 70 360 310" aria-hidden className={className} fill="none">
      <polygon points={shelf.map((p) => p.join(',')).join(' ')} fill="#0b7a75" fillOpacity={0.28} stroke="#5fb8b3" strokeWidth={2} />
      {edges.map(([a, b]) => {
        const [x1, y1] = project(...corners[a]);
        const [x2, y2] = project(...corners[b]);
        return <line key={`${a}-${b}`} x1={x1} y1={y1} x2={x2} y2={y2} stroke="currentColor" strokeWidth={9} strokeLinecap="square" />;
      })}
      {edges.map(([a, b]) => {
        const [x1, y1] = project(...corners[a]);
        const [x2, y2] = project(...corners[b]);
        return <line key={`slot-${a}-${b}`} x1={x1} y1={y1} x2={x2} y2={y2} stroke="#1d2329" strokeWidth={2} strokeDasharray="0" />;
      })}
      {corners.map((corner, index) => {
        const [cx, cy] = project(...corner);
        return <rect key={index} x={cx - 7} y={cy - 7} width={14} height={14} rx={2} fill="#d7efed" />;
      })}
    </svg>
  );
}
