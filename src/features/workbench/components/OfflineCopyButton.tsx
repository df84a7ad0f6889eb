import { useState } from 'react';
import { CloudDownload } from 'lucide-react';
import { Button } from '@/components/ui';
import type { BuildDetail } from '@/domain/contracts/builds';

const CACHE = 'slotwise-builds';

/**
 * Keeps this build on the device: the build and its design revision go into the service worker's
 * cache. Step pictures are rendered on the device from the revision by the shared 3D viewer,
 * whose code the service worker precaches with the rest of the app, so they need nothing more.
 */
export function OfflineCopyButton({ detail }: { detail: BuildDetail }) {
  const [state, setState] = useState<'idle' | 'saving' | 'saved' | 'failed'>('idle');
  if (typeof caches === 'undefined') return null;
  const save = async () => {
    setState('saving');
    try {
      const cache = await caches.open(CACHE);
      const { build } = detail;
      await cache.addAll([`/api/builds/${build.id}`, `/api/designs/${build.designId}/revisions/${build.revision}`, `/workbench/builds/${build.id}`]);
      setState('saved');
    } catch {
      setState('failed');
    }
  };
  return (
    <Button icon={<CloudDownload aria-hidden className="size-4" />} pending={state === 'saving'} onClick={() => void save()}>
      {state === 'saved' ? 'Kept for offline' : state === 'failed' ? 'Could not keep it; try again' : 'Keep for offline'}
    </Button>
  );
}
