// Every route's path and href builder in one place.
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
  rateCalculator: { path: '/rate-calculator', href: () => '/rate-calculator' },
  acceptInvitation: { path: '/invitations/:token', href: (token: string) => `/invitations/${token}` },
  outbox: { path: '/outbox', href: () => '/outbox' },
} as const;
