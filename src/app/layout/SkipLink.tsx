/** First focusable element on every page: jumps past the navigation to the page's main content. */
export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only z-50 rounded-lg bg-accent px-4 py-3 text-sm font-semibold text-accent-ink focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:px-4 focus:py-3 focus:shadow-lg focus-ring"
    >
      Skip to content
    </a>
  );
}
