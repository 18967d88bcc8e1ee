import { ROLES, type Role } from '@evenset/contracts';

interface AppPath {
  readonly path: string;
  /** Who may open the page; pages without roles are public. */
  readonly roles?: readonly Role[];
  readonly getHref: (...args: never[]) => string;
}

/** Every route of the web app, and how to link to it. */
export const paths = {
  home: { path: '/', roles: ROLES, getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    /** `next` is where to return after signing in (path + query of the page that was asked for). */
    getHref: (next?: string) => (next ? `/sign-in?${new URLSearchParams({ next }).toString()}` : '/sign-in'),
  },
  people: { path: '/people', roles: ['admin'], getHref: () => '/people' },
} as const satisfies Record<string, AppPath>;
