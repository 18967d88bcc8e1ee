import { lazy, type ComponentType } from 'react';

/** A page component in a chunk of its own, loaded on first render or earlier by `preload`. */
export type LazyPage = ReturnType<typeof lazy<ComponentType>> & { preload: () => Promise<unknown> };

/** What a route carries so that its chunk can be fetched before it renders (see router.tsx). */
export interface PreloadHandle {
  preload: () => Promise<unknown>;
}

/**
 * A lazily loaded page that can also be asked to load ahead: the router starts the chunks of the
 * address being opened at once, beside the session check, instead of one after another as each
 * renders. A failed load is forgotten, so that the next render tries again.
 */
export function lazyPage(load: () => Promise<ComponentType>): LazyPage {
  let loading: Promise<{ default: ComponentType }> | undefined;
  const preload = () =>
    (loading ??= load().then(
      (component) => ({ default: component }),
      (error: unknown) => {
        loading = undefined;
        throw error;
      },
    ));
  return Object.assign(lazy(preload), { preload });
}
