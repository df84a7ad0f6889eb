import { Save } from 'lucide-react';
import { Button } from '@/components/ui';
import { useEditorStore } from '../store/editorStore';
import { isMacPlatform } from '../hooks/shortcutList';

/** Saves a new revision; shows progress while the request runs. */
export function SaveButton({ saving, onSave }: { saving: boolean; onSave: () => void }) {
  const dirty = useEditorStore((state) => state.dirty);
  const mod = isMacPlatform() ? '⌘' : 'Ctrl';
  return (
    <Button
      variant={dirty ? 'primary' : 'secondary'}
      pending={saving}
      icon={<Save aria-hidden className="size-4" />}
      title={`Save a new revision (${mod}+S)`}
      onClick={onSave}
    >
      {saving ? 'Saving…' : 'Save'}
    </Button>
  );
}
