import { Download } from 'lucide-react';
import { Button, Dialog } from '@/components/ui';
import type { SaveDesignState } from './useSaveDesign';

/** A save refused because someone else saved first: nothing local is lost whichever way the person chooses. */
export function StaleRevisionDialog({ saveState }: { saveState: SaveDesignState }) {
  const { conflict, loadTheirs, keepEditing, saveOnTop, resolving, saving } = saveState;
  const revision = conflict?.latestRevision;
  return (
    <Dialog
      open={conflict !== null}
      role="alertdialog"
      title={revision ? `Someone saved revision ${revision} while you were editing` : 'Someone saved a newer revision while you were editing'}
      description="Your changes have not been saved yet. They stay here until you choose."
      onClose={keepEditing}
    >
      <div className="flex flex-col gap-3">
        <Button variant="primary" icon={<Download aria-hidden className="size-4" />} pending={resolving} onClick={() => void loadTheirs()}>
          Load theirs (your changes are kept as a JSON download)
        </Button>
        {revision ? (
          <Button variant="secondary" pending={saving} onClick={() => void saveOnTop()}>
            Save mine as revision {revision + 1} (theirs stays in the history)
          </Button>
        ) : null}
        <Button data-autofocus variant="ghost" onClick={keepEditing}>
          Keep editing
        </Button>
      </div>
    </Dialog>
  );
}
