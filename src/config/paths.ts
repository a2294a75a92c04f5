/**
 * Every client path, in one typed registry. Route definitions use `path`;
 * links and redirects use `getHref(...)`, so a path is spelled once.
 */

const withNext = (base: string, next?: string) =>
  next && next !== '/' ? `${base}?next=${encodeURIComponent(next)}` : base;

const inWorkshop = (segment: string) => ({
  path: `/w/:workshopId/${segment}`,
  getHref: (workshopId: string) => `/w/${encodeURIComponent(workshopId)}/${segment}`,
});

export const paths = {
  home: { path: '/', getHref: () => '/' },

  signIn: { path: '/sign-in', getHref: (next?: string) => withNext('/sign-in', next) },
  signUp: { path: '/sign-up', getHref: (next?: string) => withNext('/sign-up', next) },
  forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
  resetPassword: {
    path: '/reset-password',
    getHref: (token?: string) =>
      token ? `/reset-password?token=${encodeURIComponent(token)}` : '/reset-password',
  },
  invitation: {
    path: '/invitations/:token',
    getHref: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  },

  createWorkshop: { path: '/workshops/new', getHref: () => '/workshops/new' },
  settings: {
    path: '/settings',
    getHref: (section?: string) => (section ? `/settings#${section}` : '/settings'),
  },
  safety: {
    path: '/safety',
    getHref: (section?: string) => (section ? `/safety#${section}` : '/safety'),
  },
  devMail: { path: '/dev/mail', getHref: () => '/dev/mail' },

  workshop: {
    path: '/w/:workshopId',
    getHref: (workshopId: string) => `/w/${encodeURIComponent(workshopId)}`,
  },
  heats: inWorkshop('heats'),
  gallery: inWorkshop('gallery'),
  reports: inWorkshop('reports'),
  guide: inWorkshop('guide'),
  equipment: inWorkshop('equipment'),
  calculators: inWorkshop('calculators'),
  insights: inWorkshop('insights'),
  heatTreatment: inWorkshop('heat-treatment'),
  heatTreatmentDetail: {
    path: '/w/:workshopId/heat-treatment/:heatTreatmentId',
    getHref: (workshopId: string, heatTreatmentId: string) =>
      `/w/${encodeURIComponent(workshopId)}/heat-treatment/${encodeURIComponent(heatTreatmentId)}`,
  },
  heatTreatmentSheet: {
    path: '/w/:workshopId/heat-treatment/:heatTreatmentId/sheet',
    getHref: (workshopId: string, heatTreatmentId: string) =>
      `/w/${encodeURIComponent(workshopId)}/heat-treatment/${encodeURIComponent(heatTreatmentId)}/sheet`,
  },
  members: inWorkshop('members'),
  guideKind: {
    path: '/w/:workshopId/guide/:kindId',
    getHref: (workshopId: string, kindId: string) => `/w/${encodeURIComponent(workshopId)}/guide/${encodeURIComponent(kindId)}`,
  },
  calculator: {
    path: '/w/:workshopId/calculators/:calculatorId',
    getHref: (workshopId: string, calculatorId: string) =>
      `/w/${encodeURIComponent(workshopId)}/calculators/${encodeURIComponent(calculatorId)}`,
  },
  alloys: inWorkshop('alloys'),
  // The heat log's own pages; the fixed segments (new, import) rank above :heatId.
  heatNew: inWorkshop('heats/new'),
  heatImport: inWorkshop('heats/import'),
  heat: {
    path: '/w/:workshopId/heats/:heatId',
    getHref: (workshopId: string, heatId: string) => `/w/${encodeURIComponent(workshopId)}/heats/${encodeURIComponent(heatId)}`,
  },
  heatEdit: {
    path: '/w/:workshopId/heats/:heatId/edit',
    getHref: (workshopId: string, heatId: string) => `/w/${encodeURIComponent(workshopId)}/heats/${encodeURIComponent(heatId)}/edit`,
  },
  furnace: {
    path: '/w/:workshopId/equipment/furnaces/:furnaceId',
    getHref: (workshopId: string, furnaceId: string) =>
      `/w/${encodeURIComponent(workshopId)}/equipment/furnaces/${encodeURIComponent(furnaceId)}`,
  },
  crucible: {
    path: '/w/:workshopId/equipment/crucibles/:crucibleId',
    getHref: (workshopId: string, crucibleId: string) =>
      `/w/${encodeURIComponent(workshopId)}/equipment/crucibles/${encodeURIComponent(crucibleId)}`,
  },
  photo: {
    path: '/w/:workshopId/photos/:photoId',
    getHref: (workshopId: string, photoId: string) => `/w/${encodeURIComponent(workshopId)}/photos/${encodeURIComponent(photoId)}`,
  },
  casting: {
    path: '/w/:workshopId/heats/:heatId/castings/:castingId',
    getHref: (workshopId: string, heatId: string, castingId: string) =>
      `/w/${encodeURIComponent(workshopId)}/heats/${encodeURIComponent(heatId)}/castings/${encodeURIComponent(castingId)}`,
  },
  report: {
    path: '/w/:workshopId/reports/:reportId',
    getHref: (workshopId: string, reportId: string) => `/w/${encodeURIComponent(workshopId)}/reports/${encodeURIComponent(reportId)}`,
  },
  quickCheck: inWorkshop('quick-check'),
  review: inWorkshop('review'),
  student: {
    path: '/w/:workshopId/students/:userId',
    getHref: (workshopId: string, userId: string) => `/w/${encodeURIComponent(workshopId)}/students/${encodeURIComponent(userId)}`,
  },
  rules: inWorkshop('rules'),
} as const;

/**
 * A `next` value from the query string, made safe to navigate to: only a path
 * on this site (starts with one slash), never another origin.
 */
export function safeNextPath(next: string | null | undefined, fallback = '/'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) {
    return fallback;
  }
  return next;
}

/** The same section of another workshop, e.g. /w/a/gallery → /w/b/gallery. */
export function switchWorkshopPath(pathname: string, workshopId: string): string {
  const match = /^\/w\/[^/]+(\/[^?#]*)?/.exec(pathname);
  const rest = match?.[1] && match[1] !== '/' ? match[1] : '/heats';
  return `/w/${encodeURIComponent(workshopId)}${rest}`;
}
