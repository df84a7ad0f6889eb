import { useEffect, useMemo, useState } from 'react';
import { useParams } from 'react-router';
import { Printer } from 'lucide-react';
import { Button, ErrorNotice, PageSkeleton } from '@/components/ui';
import { buildStepPath, firstStepOfPiece, LABEL_GRID, labelSheets, pieceLabels } from '@/domain/buildInstructions';
import { labelQrDataUrl } from '../labels/labelQr';
import { useBuildData } from '../hooks/useBuildData';
import './print.css';

const mm = (value: number) => `${value}mm`;

/** A label for every cut piece, on A4 sheets of 3 × 8 labels of 70 × 37 mm; each QR opens the build at the piece's first step. */
export default function PieceLabelsPage() {
  const buildId = Number(useParams().buildId);
  const data = useBuildData(buildId);
  const labels = useMemo(() => {
    if (!data.detail || !data.design || !data.analysis || !data.steps) return [];
    return pieceLabels(data.design, data.analysis.cutList, firstStepOfPiece(data.steps, data.design), { id: data.detail.build.id, revision: data.detail.build.revision });
  }, [data.detail, data.design, data.analysis, data.steps]);
  const [codes, setCodes] = useState<Record<string, string>>({});
  useEffect(() => {
    let live = true;
    void Promise.all(labels.map(async (label) => [label.pieceId, await labelQrDataUrl(`${window.location.origin}${buildStepPath(label.buildId, label.stepId)}`)] as const)).then(
      (entries) => live && setCodes(Object.fromEntries(entries)),
    );
    return () => {
      live = false;
    };
  }, [labels]);

  if (data.build.isError) return <ErrorNotice title="This build could not be opened" message={data.build.error.message} />;
  if (!data.detail) return <PageSkeleton label="Preparing the labels" />;
  const { label, columns, rows, margin, sheet } = LABEL_GRID;

  return (
    <main className="label-document bg-white text-ink">
      <div className="no-print flex flex-wrap items-center justify-between gap-3 p-4">
        <p className="text-sm">
          {labels.length} labels on A4 sheets of {columns} × {rows} labels, {label.width} × {label.height} mm each. Check your label sheets match before printing, and print at 100 % (no scaling).
        </p>
        <Button variant="primary" icon={<Printer aria-hidden className="size-4" />} onClick={() => window.print()}>
          Print labels
        </Button>
      </div>
      <style>{`@media print { @page { size: A4; margin: 0; } }`}</style>
      {labelSheets(labels).map((page, pageIndex) => (
        <div
          key={pageIndex}
          className="label-sheet mx-auto bg-white"
          style={{
            width: mm(sheet.width),
            height: mm(sheet.height),
            paddingTop: mm(margin.top),
            paddingLeft: mm(margin.left),
            display: 'grid',
            gridTemplateColumns: `repeat(${columns}, ${mm(label.width)})`,
            gridAutoRows: mm(label.height),
            breakAfter: 'page',
            boxSizing: 'border-box',
          }}
        >
          {page.map((item) => (
            <div key={item.pieceId} data-testid="piece-label" data-piece={item.pieceId} className="flex gap-1 overflow-hidden p-[2mm] outline outline-1 outline-dashed outline-paper-line print:outline-none" style={{ fontSize: '7.5pt', lineHeight: 1.2 }}>
              {codes[item.pieceId] ? <img src={codes[item.pieceId]} alt={`QR code: open build ${item.buildId} at the first step using ${item.pieceId}`} style={{ width: '24mm', height: '24mm' }} /> : <div style={{ width: '24mm' }} />}
              <div className="min-w-0 flex-1">
                <p style={{ fontSize: '11pt' }} className="font-bold">
                  {item.pieceId} · {item.length}
                </p>
                <p className="truncate">{item.name}</p>
                {item.machining.map((text) => (
                  <p key={text} className="truncate">{text}</p>
                ))}
                <p className="truncate text-ink-soft">
                  {item.designName} · rev {item.revision} · build {item.buildId}
                </p>
              </div>
            </div>
          ))}
        </div>
      ))}
    </main>
  );
}
