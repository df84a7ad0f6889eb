import { lazy, Suspense, type ComponentType, type ReactNode } from 'react';

/**
 * A page loaded on first render (React.lazy), with a skeleton meanwhile. Used instead of the router's
 * `lazy` so that route guards run first: a visitor who is redirected never downloads the page's code.
 */
export function lazyPage(load: () => Promise<{ default: ComponentType }>, fallback: ReactNode): ComponentType {
  const Page = lazy(load);
  return function LazyPage() {
    return (
      <Suspense fallback={fallback}>
        <Page />
      </Suspense>
    );
  };
}
