import type { ReactNode } from 'react';

/** Page body with the standard width and padding (the editor does not use it: it is full-bleed). */
export function PageFrame({ children }: { children: ReactNode }) {
  return <div className="mx-auto flex w-full max-w-6xl flex-col gap-6 px-4 py-6 md:px-8 md:py-8">{children}</div>;
}
