// Every route in one place: the router reads `path`, links call `href()`.

/** Only same-site paths may be a return target, so a crafted link cannot send people elsewhere. */
export function safeReturnPath(candidate: string | null | undefined): string | undefined {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//') || candidate.includes('\\')) {
    return undefined;
  }
  return candidate;
}

function withQuery(path: string, params: Record<string, string | undefined>): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value) query.set(key, value);
  const text = query.toString();
  return text ? `${path}?${text}` : path;
}

function place(path: string) {
  return { path, href: () => path };
}

export const paths = {
  home: place('/'),
  search: { path: '/search', href: (q?: string) => withQuery('/search', { q: q?.trim() }) },
  auth: {
    signIn: {
      path: '/sign-in',
      href: (returnTo?: string) => withQuery('/sign-in', { returnTo: safeReturnPath(returnTo) }),
    },
    signUp: {
      path: '/sign-up',
      href: (returnTo?: string) => withQuery('/sign-up', { returnTo: safeReturnPath(returnTo) }),
    },
    verifyEmail: { path: '/verify-email', href: (token?: string) => withQuery('/verify-email', { token }) },
    forgotPassword: place('/forgot-password'),
    resetPassword: { path: '/reset-password', href: (token?: string) => withQuery('/reset-password', { token }) },
  },
  account: place('/account'),
  meets: place('/meets'),
  results: place('/results'),
  standings: place('/standings'),
  rack: { path: '/rack', href: (clubId?: string) => withQuery('/rack', { club: clubId }) },
  rackAxe: { path: '/rack/axes/:axeId', href: (axeId: string) => `/rack/axes/${encodeURIComponent(axeId)}` },
  rackGeometry: place('/rack/geometry'),
  rackLineup: {
    path: '/rack/lineups/:meetId',
    href: (meetId: string, clubId?: string) => withQuery(`/rack/lineups/${encodeURIComponent(meetId)}`, { club: clubId }),
  },
  trials: place('/trials'),
  grainMap: place('/grain-map'),
  fieldNotes: place('/field-notes'),
  firstCuts: place('/first-cuts'),
  meet: { path: '/meets/:meetId', href: (meetId: string) => `/meets/${encodeURIComponent(meetId)}` },
  newMeet: place('/meets/new'),
  editMeet: { path: '/meets/:meetId/edit', href: (meetId: string) => `/meets/${encodeURIComponent(meetId)}/edit` },
  clubs: place('/clubs'),
  club: { path: '/clubs/:clubId', href: (clubId: string) => `/clubs/${encodeURIComponent(clubId)}` },
  athlete: { path: '/athletes/:athleteId', href: (athleteId: string) => `/athletes/${encodeURIComponent(athleteId)}` },
  /** The link in a club invitation e-mail (the server writes `/join-club?token=…`). */
  joinClub: { path: '/join-club', href: (token?: string) => withQuery('/join-club', { token }) },
  fieldNote: { path: '/field-notes/:slug', href: (slug: string, options: { draft?: boolean } = {}) => withQuery(`/field-notes/${encodeURIComponent(slug)}`, { draft: options.draft ? '1' : undefined }) },
  newFieldNote: place('/field-notes/new'),
  editFieldNote: { path: '/field-notes/:slug/edit', href: (slug: string) => `/field-notes/${encodeURIComponent(slug)}/edit` },
  fieldNoteHistory: { path: '/field-notes/:slug/history', href: (slug: string) => `/field-notes/${encodeURIComponent(slug)}/history` },
  fieldNotesReview: place('/field-notes/review'),
  myFieldNotes: place('/field-notes/mine'),
  /** The Trials place for one club (members of several clubs pick one). */
  trialsOfClub: { path: '/trials', href: (clubId?: string) => withQuery('/trials', { club: clubId }) },
  newTrial: { path: '/trials/new', href: (clubId: string) => withQuery('/trials/new', { club: clubId }) },
  trial: { path: '/trials/:trialId', href: (trialId: string) => `/trials/${encodeURIComponent(trialId)}` },
  recordTrial: { path: '/trials/:trialId/record', href: (trialId: string) => `/trials/${encodeURIComponent(trialId)}/record` },
  handicapMarks: {
    path: '/meets/:meetId/handicap/:meetEventId',
    href: (meetId: string, meetEventId: string) => `/meets/${encodeURIComponent(meetId)}/handicap/${encodeURIComponent(meetEventId)}`,
  },
  /** The link in the publish e-mail (the server writes `/results/meets/:meetId`). */
  meetResults: { path: '/results/meets/:meetId', href: (meetId: string) => `/results/meets/${encodeURIComponent(meetId)}` },
  postResults: {
    path: '/results/meets/:meetId/post',
    href: (meetId: string, meetEventId?: string) => withQuery(`/results/meets/${encodeURIComponent(meetId)}/post`, { event: meetEventId }),
  },
  records: place('/results/records'),
  seasonStandings: {
    path: '/standings',
    href: (seasonId?: string, division?: string) => withQuery('/standings', { season: seasonId, division: division?.toLowerCase() }),
  },
} as const;
