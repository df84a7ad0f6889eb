/** The Slotwise mark: a profile cross-section with four T-shaped slots, on the accent tile. Decorative unless `title` is given. */
export function SlotwiseMark({ className, title }: { className?: string; title?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} role={title ? 'img' : undefined} aria-hidden={title ? undefined : true} aria-label={title}>
      <rect x="0" y="0" width="32" height="32" rx="8" fill="#0b7a75" />
      <rect x="6" y="6" width="20" height="20" rx="2.5" fill="#ffffff" />
      {[0, 90, 180, 270].map((angle) => (
        <g key={angle} transform={`rotate(${angle} 16 16)`} fill="#0b7a75">
          <rect x="14.2" y="5.5" width="3.6" height="3.3" />
          <path d="M11.6 8.6h8.8l-1.6 2.6h-5.6z" />
        </g>
      ))}
      <circle cx="16" cy="16" r="2.4" fill="#0b7a75" />
      <circle cx="16" cy="16" r="1" fill="#d7efed" />
    </svg>
  );
}
