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
  customers: { path: '/customers', roles: ['sales', 'service', 'engineer', 'admin'], getHref: () => '/customers' },
  customer: {
    path: '/customers/:customerId',
    roles: ['sales', 'service', 'engineer', 'admin'],
    getHref: (customerId: string) => `/customers/${encodeURIComponent(customerId)}`,
  },
  sets: {
    path: '/sets',
    roles: ['sales', 'service', 'engineer', 'admin'],
    /** `partNumber` opens the list filtered to one part number. */
    getHref: (partNumber?: string) =>
      partNumber ? `/sets?${new URLSearchParams({ partNumber }).toString()}` : '/sets',
  },
  /** The set builder: sales (and admin) allocate free parts to a customer's order. */
  setNew: {
    path: '/sets/new',
    roles: ['sales', 'admin'],
    /** `customerId` opens the builder with that customer already chosen. */
    getHref: (customerId?: string) =>
      customerId ? `/sets/new?${new URLSearchParams({ customerId }).toString()}` : '/sets/new',
  },
  set: {
    path: '/sets/:setId',
    roles: ['sales', 'service', 'engineer', 'admin'],
    getHref: (setId: string) => `/sets/${encodeURIComponent(setId)}`,
  },
  certificates: {
    path: '/certificates',
    roles: ['sales', 'service', 'engineer', 'admin'],
    getHref: () => '/certificates',
  },
  /** Public: the page behind a certificate's QR code. */
  verify: { path: '/verify/:code', getHref: (code: string) => `/verify/${encodeURIComponent(code)}` },
  outbox: { path: '/outbox', roles: ['admin'], getHref: () => '/outbox' },
  /** `subjectId` opens the log filtered to one record's changes. */
  auditLog: {
    path: '/audit-log',
    roles: ['engineer', 'admin'],
    getHref: (subjectId?: string) =>
      subjectId ? `/audit-log?${new URLSearchParams({ subjectId }).toString()}` : '/audit-log',
  },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  resetPassword: {
    path: '/reset-password',
    getHref: (token: string) => `/reset-password?${new URLSearchParams({ token }).toString()}`,
  },
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
  /** `q` opens the check for a certificate number, set number or serial. */
  replacements: {
    path: '/replacements',
    roles: ['service', 'sales', 'engineer', 'admin'],
    getHref: (q?: string) => (q ? `/replacements?${new URLSearchParams({ q }).toString()}` : '/replacements'),
  },
  /** `partNumber` opens the trend of that part number. */
  trends: {
    path: '/trends',
    roles: ['engineer', 'admin', 'inspector'],
    getHref: (partNumber?: string) =>
      partNumber ? `/trends?${new URLSearchParams({ partNumber }).toString()}` : '/trends',
  },
  gaugeStudies: { path: '/gauge-studies', roles: ['engineer'], getHref: () => '/gauge-studies' },
  gaugeStudy: {
    path: '/gauge-studies/:studyId',
    roles: ['engineer'],
    getHref: (studyId: string) => `/gauge-studies/${encodeURIComponent(studyId)}`,
  },
  /** An inspector's blind measuring of one study, from the Bench. */
  gaugeStudyBench: {
    path: '/bench/gauge-studies/:studyId',
    roles: ['inspector'],
    getHref: (studyId: string) => `/bench/gauge-studies/${encodeURIComponent(studyId)}`,
  },
  grindRequests: { path: '/grind-requests', roles: ROLES, getHref: () => '/grind-requests' },
  grindRequest: {
    path: '/grind-requests/:requestId',
    roles: ROLES,
    getHref: (requestId: string) => `/grind-requests/${encodeURIComponent(requestId)}`,
  },
} as const satisfies Record<string, AppPath>;
