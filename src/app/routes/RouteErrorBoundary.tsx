import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { RotateCw } from 'lucide-react';
import { Button, ErrorNotice } from '@/components/ui';
import { isApiError } from '@/lib/apiClient';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (isApiError(error)) return error.message;
  if (error instanceof Error && /dynamically imported module|Importing a module script failed|Failed to fetch/i.test(error.message)) {
    return 'Part of Slotwise could not be downloaded — perhaps the connection dropped or a new version was just installed.';
  }
  return 'An unexpected problem stopped this page from showing.';
}

/** Route-level error screen: says what happened in words and offers a reload, keeping the rest of the app reachable. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4 px-4 py-12">
      <h1 className="text-2xl font-semibold tracking-tight">This page could not be shown</h1>
      <ErrorNotice message={describe(error)} />
      <div className="flex flex-wrap gap-2">
        <Button variant="primary" icon={<RotateCw aria-hidden className="size-4" />} onClick={() => window.location.reload()}>
          Try again
        </Button>
        <Link to="/" className="inline-flex min-h-11 items-center rounded-lg border border-paper-line bg-paper-raised px-4 text-sm font-medium focus-ring hover:bg-paper-sunk">
          Go to the start page
        </Link>
      </div>
    </div>
  );
}
