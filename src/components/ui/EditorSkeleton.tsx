import { Skeleton } from './Skeleton';

/** Editor-shaped placeholder: while the 3D editor's code downloads, and while a design opens. */
export function EditorSkeleton({ label = 'Loading the editor…' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex h-dvh flex-col md:h-full">
      <span className="sr-only">{label}</span>
      <Skeleton className="h-14 rounded-none" />
      <div className="flex flex-1 gap-2 p-2">
        <Skeleton className="w-[72px]" />
        <Skeleton className="flex-1" />
        <Skeleton className="hidden w-[340px] lg:block" />
      </div>
    </div>
  );
}
