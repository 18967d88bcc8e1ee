import { useEffect, useRef } from 'react';

/**
 * Leaves a Performance API mark `evenset:<name>-ready` the first time `ready` holds: when the page's
 * data-driven content has been committed. The mark waits for the next animation frame, the one that
 * paints that content, so it stands for "on screen". `npm run bench` (scripts/bench-web.mjs) reads it
 * with performance.getEntriesByName; nothing else does.
 */
export function useRenderMark(name: string, ready: boolean): void {
  const marked = useRef(false);
  useEffect(() => {
    // jsdom (the unit tests) has no performance.mark; the mark only serves the bench.
    if (!ready || marked.current || typeof performance.mark !== 'function') return;
    marked.current = true;
    requestAnimationFrame(() => performance.mark(`evenset:${name}-ready`));
  }, [name, ready]);
}
