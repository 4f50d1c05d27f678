// Every route's path and href builder in one place.

/** A trial page that shows one site and round at a time: `/trials/3/ledger?site=31&round=21`. */
function siteRoundHref(trialId: number, section: string, siteId?: number, roundId?: number): string {
  const query = new URLSearchParams();
  if (siteId) query.set('site', String(siteId));
  if (roundId) query.set('round', String(roundId));
  const text = query.toString();
  return `/trials/${trialId}/${section}${text ? `?${text}` : ''}`;
}

export const paths = {
  signIn: {
    path: '/sign-in',
    href: (returnTo?: string) => (returnTo && returnTo !== '/' ? `/sign-in?returnTo=${encodeURIComponent(returnTo)}` : '/sign-in'),
  },
  home: { path: '/', href: () => '/' },
  trials: { path: '/trials', href: () => '/trials' },
  trial: { path: '/trials/:trialId', href: (trialId: number) => `/trials/${trialId}` },
  trialProtocol: { path: '/trials/:trialId/protocol', href: (trialId: number) => `/trials/${trialId}/protocol` },
  trialSites: { path: '/trials/:trialId/sites', href: (trialId: number) => `/trials/${trialId}/sites` },
  trialPlotPlan: {
    path: '/trials/:trialId/plot-plan',
    href: (trialId: number, siteId?: number) => `/trials/${trialId}/plot-plan${siteId ? `?site=${siteId}` : ''}`,
  },
  trialTeam: { path: '/trials/:trialId/team', href: (trialId: number) => `/trials/${trialId}/team` },
  trialIntake: { path: '/trials/:trialId/intake', href: (trialId: number, siteId?: number, roundId?: number) => siteRoundHref(trialId, 'intake', siteId, roundId) },
  trialLedger: { path: '/trials/:trialId/ledger', href: (trialId: number, siteId?: number, roundId?: number) => siteRoundHref(trialId, 'ledger', siteId, roundId) },
  /** The Round walk: one site and round, plot by plot; `plot` opens that plot (the Sheets' QR codes point here). */
  trialWalk: {
    path: '/trials/:trialId/walk',
    href: (trialId: number, siteId?: number, roundId?: number, plotId?: number) => {
      const href = siteRoundHref(trialId, 'walk', siteId, roundId);
      return plotId ? `${href}${href.includes('?') ? '&' : '?'}plot=${plotId}` : href;
    },
  },
  trialFindings: { path: '/trials/:trialId/findings', href: (trialId: number) => `/trials/${trialId}/findings` },
  trialReport: {
    path: '/trials/:trialId/report',
    /** With the Findings page's choices (round, site, sites, method, alpha) as they appear in its own address. */
    href: (trialId: number, choices: Record<string, string | number | undefined> = {}) => {
      const query = new URLSearchParams(Object.entries(choices).flatMap(([key, value]) => (value === undefined || value === '' ? [] : [[key, String(value)]]))).toString();
      return `/trials/${trialId}/report${query ? `?${query}` : ''}`;
    },
  },
  trialActivity: { path: '/trials/:trialId/activity', href: (trialId: number) => `/trials/${trialId}/activity` },
  rateCalculator: { path: '/rate-calculator', href: () => '/rate-calculator' },
  planner: { path: '/planner', href: () => '/planner' },
  quickAnalysis: { path: '/quick-analysis', href: () => '/quick-analysis' },
  acceptInvitation: { path: '/invitations/:token', href: (token: string) => `/invitations/${token}` },
  outbox: { path: '/outbox', href: () => '/outbox' },
  people: { path: '/people', href: () => '/people' },
  account: { path: '/account', href: () => '/account' },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  /** The e-mailed link is APP_URL/reset-password/<token> (the API writes it). */
  resetPassword: { path: '/reset-password/:token', href: (token: string) => `/reset-password/${token}` },
} as const;
