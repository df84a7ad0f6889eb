import { useRef, useState, type ChangeEvent } from 'react';
import { useNavigate } from 'react-router';
import { FileUp } from 'lucide-react';
import { Button, Dialog, ErrorNotice } from '@/components/ui';
import { isApiError } from '@/lib/apiClient';
import { messageOf } from '@/lib/formErrors';
import { useImportDesign } from '../api/importDesign';

/** Imports a design document (.json); a bad file lists its problems and changes nothing. */
export function ImportDesignButton() {
  const input = useRef<HTMLInputElement>(null);
  const importing = useImportDesign();
  const navigate = useNavigate();
  const [problem, setProblem] = useState<{ message: string; fields: [string, string][] } | null>(null);

  const onFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    let json: unknown;
    try {
      json = JSON.parse(await file.text());
    } catch {
      setProblem({ message: `${file.name} is not a JSON file. Export a design as design.json and try again.`, fields: [] });
      return;
    }
    importing.mutate(json, {
      onSuccess: ({ design }) => navigate(`/designs/${design.id}`),
      onError: (error) => setProblem({ message: messageOf(error), fields: isApiError(error) ? Object.entries(error.fields).slice(0, 20) : [] }),
    });
  };

  return (
    <>
      <Button icon={<FileUp aria-hidden className="size-4" />} pending={importing.isPending} onClick={() => input.current?.click()}>
        Import
      </Button>
      <input ref={input} type="file" accept="application/json,.json" className="sr-only" aria-label="Design file to import" onChange={onFile} />
      <Dialog open={problem !== null} title="This file cannot be imported" description="Nothing was changed." onClose={() => setProblem(null)}>
        <ErrorNotice message={problem?.message ?? ''} />
        {problem && problem.fields.length > 0 && (
          <ul className="mt-2 list-disc pl-5 text-sm">
            {problem.fields.map(([path, message]) => (
              <li key={path}><code className="text-xs">{path}</code>: {message}</li>
            ))}
          </ul>
        )}
      </Dialog>
    </>
  );
}
