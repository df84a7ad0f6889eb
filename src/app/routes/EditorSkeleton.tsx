import { Skeleton } from '@/components/ui';

/** Editor-shaped placeholder while the 3D editor's code downloads. */
export function EditorSkeleton() {
  return (
    <div role="status" aria-live="polite" className="flex h-dvh flex-col md:h-full">
      <span className="sr-only">Loading the editor…</span>
      <Skeleton className="h-14 rounded-none" />
      <div className="flex flex-1 gap-2 p-2">
        <Skeleton className="w-[72px]" />
        <Skeleton className="flex-1" />
        <Skeleton className="hidden w-[340px] lg:block" />
      </div>
    </div>
  );
}
