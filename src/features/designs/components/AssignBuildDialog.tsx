import { useState, type FormEvent } from 'react';
import { Button, Dialog, DialogActions, ErrorNotice, TextField } from '@/components/ui';
import { messageOf } from '@/lib/formErrors';
import { useCreateBuild } from '../api/createBuild';
import { useBuilders } from '../api/listBuilders';
import type { DesignSummary } from '../api/schemas';

/** Plans a build of the design's latest revision: builders, due date and a note. */
export function AssignBuildDialog({ design, onClose }: { design: DesignSummary | null; onClose: () => void }) {
  const builders = useBuilders(design !== null);
  const create = useCreateBuild();
  const [chosen, setChosen] = useState<number[]>([]);
  const [dueDate, setDueDate] = useState('');
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);

  const close = () => {
    setChosen([]);
    setDueDate('');
    setNote('');
    setError(null);
    create.reset();
    onClose();
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!design) return;
    if (chosen.length === 0) return setError('Choose at least one builder.');
    create.mutate({ designId: design.id, builderIds: chosen, dueDate: dueDate || null, note: note || undefined }, { onSuccess: close, onError: (failure) => setError(messageOf(failure)) });
  };

  return (
    <Dialog open={design !== null} title={`Assign a build of ${design?.name ?? ''}`} description={design ? `Revision ${design.latestRevision} goes to the builders you choose.` : undefined} onClose={close}>
      <form onSubmit={submit} className="flex flex-col gap-4">
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-sm font-medium text-ink">Builders</legend>
          {builders.data?.map((person) => (
            <label key={person.id} className="flex min-h-11 items-center gap-3 rounded-lg border border-paper-line px-3">
              <input
                type="checkbox"
                className="size-5"
                checked={chosen.includes(person.id)}
                onChange={(event) => setChosen((ids) => (event.target.checked ? [...ids, person.id] : ids.filter((id) => id !== person.id)))}
              />
              {person.displayName}
            </label>
          ))}
          {builders.data?.length === 0 ? <p className="text-sm text-ink-soft">There are no active builders. The shop owner adds them on the People page.</p> : null}
        </fieldset>
        <TextField id="build-due-date" label="Due date" type="date" value={dueDate} onChange={(event) => setDueDate(event.target.value)} />
        <TextField id="build-note" label="Note for the builders" value={note} maxLength={1000} onChange={(event) => setNote(event.target.value)} />
        {error ? <ErrorNotice title="The build was not assigned" message={error} /> : null}
        <DialogActions>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="primary" pending={create.isPending}>
            Assign build
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
