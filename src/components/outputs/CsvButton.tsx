import { Download } from 'lucide-react';
import { downloadCsv } from './csv';

/** A download button that builds its CSV only when pressed. */
export function CsvButton({ label, fileName, build }: { label: string; fileName: string; build: () => string }) {
  return (
    <button
      type="button"
      onClick={() => downloadCsv(fileName, build())}
      className="inline-flex min-h-[44px] items-center gap-1.5 rounded border border-paper-line bg-paper-raised px-3 text-sm text-ink hover:bg-paper-sunk focus-visible:outline focus-visible:outline-2 focus-visible:outline-accent"
    >
      <Download aria-hidden="true" className="h-4 w-4" />
      {label}
    </button>
  );
}
