import { useState } from 'react';
import { Box, Smartphone } from 'lucide-react';
import type { DesignDocument } from '@/domain/design/schema';
import { Button } from '@/components/ui';
import { downloadBlob, exportFileName } from '@/lib/download';
import { quickLookSupported } from '@/lib/roomSupport';

/** Downloads the model as glTF binary (.glb), built with three's GLTFExporter. */
export function GltfExportButton({ design }: { design: DesignDocument }) {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant="ghost"
      pending={busy}
      icon={<Box aria-hidden className="size-4" />}
      onClick={async () => {
        setBusy(true);
        try {
          const { designToGlb } = await import('@/lib/gltfExport');
          const glb = await designToGlb(design);
          downloadBlob(exportFileName(design.name, 'glb'), new Blob([glb], { type: 'model/gltf-binary' }));
        } finally {
          setBusy(false);
        }
      }}
    >
      glTF
    </Button>
  );
}

/**
 * Downloads the model as USDZ (three's USDZExporter) for phones and tablets that open it in their
 * own AR viewer. Hidden where the browser opens such links itself: "See it in the room" links the
 * same file there.
 */
export function UsdzExportButton({ design }: { design: DesignDocument }) {
  const [busy, setBusy] = useState(false);
  const [hidden] = useState(quickLookSupported);
  if (hidden) return null;
  return (
    <Button
      variant="ghost"
      pending={busy}
      icon={<Smartphone aria-hidden className="size-4" />}
      title="A file phones and tablets open in their own augmented reality viewer"
      onClick={async () => {
        setBusy(true);
        try {
          const { designToUsdz } = await import('@/lib/usdzExport');
          const usdz = await designToUsdz(design);
          downloadBlob(exportFileName(design.name, 'usdz'), new Blob([usdz as BlobPart], { type: 'model/vnd.usdz+zip' }));
        } finally {
          setBusy(false);
        }
      }}
    >
      USDZ
    </Button>
  );
}
