// Every route's path and href builder in one place.
export const paths = {
  signIn: {
    path: '/sign-in',
    href: (returnTo?: string) => (returnTo && returnTo !== '/' ? `/sign-in?returnTo=${encodeURIComponent(returnTo)}` : '/sign-in'),
  },
  home: { path: '/', href: () => '/' },
  trials: { path: '/trials', href: () => '/trials' },
  trial: { path: '/trials/:trialId', href: (trialId: number) => `/trials/${trialId}` },
} as const;
