import { ROLES, type Role } from '@evenset/contracts';
import { WRITE_ROLES } from './permissions';

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
  specs: { path: '/specs', roles: ['engineer', 'inspector'], getHref: () => '/specs' },
  specNew: { path: '/specs/new', roles: WRITE_ROLES.specs, getHref: () => '/specs/new' },
  spec: {
    path: '/specs/:specId',
    roles: ['engineer', 'inspector'],
    getHref: (specId: string) => `/specs/${encodeURIComponent(specId)}`,
  },
  specEdit: {
    path: '/specs/:specId/edit',
    roles: WRITE_ROLES.specs,
    getHref: (specId: string) => `/specs/${encodeURIComponent(specId)}/edit`,
  },
  materials: { path: '/materials', roles: ['engineer', 'inspector'], getHref: () => '/materials' },
  masters: { path: '/masters', roles: ['engineer', 'inspector'], getHref: () => '/masters' },
  master: {
    path: '/masters/:masterId',
    roles: ['engineer', 'inspector'],
    getHref: (masterId: string) => `/masters/${encodeURIComponent(masterId)}`,
  },
  instruments: { path: '/instruments', roles: ['engineer', 'inspector'], getHref: () => '/instruments' },
  bench: { path: '/bench', roles: WRITE_ROLES.bench, getHref: () => '/bench' },
  lots: { path: '/lots', roles: ['engineer', 'inspector'], getHref: () => '/lots' },
  lot: {
    path: '/lots/:lotId',
    roles: ['engineer', 'inspector'],
    getHref: (lotId: string) => `/lots/${encodeURIComponent(lotId)}`,
  },
  part: {
    path: '/parts/:partId',
    roles: ['engineer', 'inspector'],
    getHref: (partId: string) => `/parts/${encodeURIComponent(partId)}`,
  },
} as const satisfies Record<string, AppPath>;
