import { useState } from 'react';
import { Box } from 'lucide-react';
import type { DesignDocument } from '@/domain/design/schema';
import { Button } from '@/components/ui';
import { downloadBlob } from '@/lib/download';

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
          downloadBlob(`${design.name.replace(/[^A-Za-z0-9]+/g, '-').toLowerCase() || 'design'}.glb`, new Blob([glb], { type: "model/gltf-binary" }));
        } finally {
          setBusy(false);
        }
      }}
    >
      glTF
    </Button>
  );
}
