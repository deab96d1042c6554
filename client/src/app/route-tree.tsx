import type { RouteObject } from 'react-router';

import { paths } from '../config/paths.js';
import { places } from '../config/places.js';
import { RequireAuth } from '../features/auth/components/require-auth.js';
import { lazyPage } from './lazy-page.js';
import { RootLayout } from './routes/root-layout.js';
import { RouteErrorPage } from './routes/route-error-page.js';

const LandingPage = lazyPage(() => import('./routes/landing/landing-page.js'), 'LandingPage');
const SignInPage = lazyPage(() => import('./routes/auth/sign-in-page.js'), 'SignInPage');
const SignUpPage = lazyPage(() => import('./routes/auth/sign-up-page.js'), 'SignUpPage');
const VerifyEmailPage = lazyPage(() => import('./routes/auth/verify-email-page.js'), 'VerifyEmailPage');
const ForgotPasswordPage = lazyPage(() => import('./routes/auth/forgot-password-page.js'), 'ForgotPasswordPage');
const ResetPasswordPage = lazyPage(() => import('./routes/auth/reset-password-page.js'), 'ResetPasswordPage');
const AccountPage = lazyPage(() => import('./routes/account/account-page.js'), 'AccountPage');
const SearchPage = lazyPage(() => import('./routes/search/search-page.js'), 'SearchPage');
const ComingSoonPage = lazyPage(() => import('./routes/places/coming-soon-page.js'), 'ComingSoonPage');
const NotFoundPage = lazyPage(() => import('./routes/not-found-page.js'), 'NotFoundPage');
const MeetsListPage = lazyPage(() => import('./routes/meets/meets-list-page.js'), 'MeetsListPage');
const MeetPage = lazyPage(() => import('./routes/meets/meet-page.js'), 'MeetPage');
const MeetBuilderPage = lazyPage(() => import('./routes/meets/meet-builder-page.js'), 'MeetBuilderPage');
const ClubsListPage = lazyPage(() => import('./routes/clubs/clubs-list-page.js'), 'ClubsListPage');
const ClubPage = lazyPage(() => import('./routes/clubs/club-page.js'), 'ClubPage');
const AthletePage = lazyPage(() => import('./routes/clubs/athlete-page.js'), 'AthletePage');
const JoinClubPage = lazyPage(() => import('./routes/clubs/join-club-page.js'), 'JoinClubPage');
const GrainMapPage = lazyPage(() => import('./routes/grain-map/grain-map-page.js'), 'GrainMapPage');
const FieldNotesPage = lazyPage(() => import('./routes/field-notes/field-notes-page.js'), 'FieldNotesPage');
const FieldNotePage = lazyPage(() => import('./routes/field-notes/field-note-page.js'), 'FieldNotePage');
const NewFieldNotePage = lazyPage(() => import('./routes/field-notes/field-note-editor-page.js'), 'NewFieldNotePage');
const EditFieldNotePage = lazyPage(() => import('./routes/field-notes/field-note-editor-page.js'), 'EditFieldNotePage');
const FieldNoteHistoryPage = lazyPage(() => import('./routes/field-notes/field-note-history-page.js'), 'FieldNoteHistoryPage');
const MyFieldNotesPage = lazyPage(() => import('./routes/field-notes/field-note-lists-page.js'), 'MyFieldNotesPage');
const FieldNotesReviewPage = lazyPage(() => import('./routes/field-notes/field-note-lists-page.js'), 'FieldNotesReviewPage');
const FirstCutsPage = lazyPage(() => import('./routes/first-cuts/first-cuts-page.js'), 'FirstCutsPage');
const RackPage = lazyPage(() => import('./routes/rack/rack-page.js'), 'RackPage');
const AxePage = lazyPage(() => import('./routes/rack/axe-page.js'), 'AxePage');
const GeometryPage = lazyPage(() => import('./routes/rack/geometry-page.js'), 'GeometryPage');
const LineupPage = lazyPage(() => import('./routes/rack/lineup-page.js'), 'LineupPage');
const TrialsListPage = lazyPage(() => import('./routes/trials/trials-list-page.js'), 'TrialsListPage');
const TrialPage = lazyPage(() => import('./routes/trials/trial-page.js'), 'TrialPage');
const NewTrialPage = lazyPage(() => import('./routes/trials/new-trial-page.js'), 'NewTrialPage');
const RecordTrialPage = lazyPage(() => import('./routes/trials/record-trial-page.js'), 'RecordTrialPage');
const HandicapPage = lazyPage(() => import('./routes/handicap/handicap-page.js'), 'HandicapPage');
const ResultsExplorerPage = lazyPage(() => import('./routes/results/results-explorer-page.js'), 'ResultsExplorerPage');
const RecordsPage = lazyPage(() => import('./routes/results/records-page.js'), 'RecordsPage');
const MeetResultsPage = lazyPage(() => import('./routes/results/meet-results-page.js'), 'MeetResultsPage');
const PostResultsPage = lazyPage(() => import('./routes/results/post-results-page.js'), 'PostResultsPage');
const SeasonStandingsPage = lazyPage(() => import('./routes/standings/season-standings-page.js'), 'SeasonStandingsPage');

// Places still being built share one page; a built place joins this set and declares its own routes.
const builtPlaces = new Set<string>(['meets', 'grainMap', 'rack', 'trials', 'fieldNotes', 'firstCuts', 'results', 'standings']);
const placeRoutes: RouteObject[] = places.filter((place) => !builtPlaces.has(place.key)).map((place) => {
  const page = <ComingSoonPage placeKey={place.key} />;
  return { path: place.href, element: place.membersOnly ? <RequireAuth>{page}</RequireAuth> : page };
});

const meetBuilder = (
  <RequireAuth roles={['ORGANISER']}>
    <MeetBuilderPage />
  </RequireAuth>
);

export const routeTree: RouteObject[] = [
  {
    element: <RootLayout />,
    errorElement: <RouteErrorPage />,
    children: [
      { index: true, element: <LandingPage /> },
      { path: paths.auth.signIn.path, element: <SignInPage /> },
      { path: paths.auth.signUp.path, element: <SignUpPage /> },
      { path: paths.auth.verifyEmail.path, element: <VerifyEmailPage /> },
      { path: paths.auth.forgotPassword.path, element: <ForgotPasswordPage /> },
      { path: paths.auth.resetPassword.path, element: <ResetPasswordPage /> },
      {
        path: paths.account.path,
        element: (
          <RequireAuth>
            <AccountPage />
          </RequireAuth>
        ),
      },
      { path: paths.search.path, element: <SearchPage /> },
      ...placeRoutes,
      { path: paths.meets.path, element: <MeetsListPage /> },
      { path: paths.meet.path, element: <MeetPage /> },
      { path: paths.newMeet.path, element: meetBuilder },
      { path: paths.editMeet.path, element: meetBuilder },
      { path: paths.clubs.path, element: <ClubsListPage /> },
      { path: paths.club.path, element: <ClubPage /> },
      { path: paths.athlete.path, element: <AthletePage /> },
      { path: paths.joinClub.path, element: <JoinClubPage /> },
      {
        path: paths.grainMap.path,
        element: (
          <RequireAuth>
            <GrainMapPage />
          </RequireAuth>
        ),
      },
      { path: paths.rack.path, element: <RequireAuth><RackPage /></RequireAuth> },
      { path: paths.rackAxe.path, element: <AxePage /> },
      { path: paths.rackGeometry.path, element: <GeometryPage /> },
      { path: paths.rackLineup.path, element: <RequireAuth><LineupPage /></RequireAuth> },
      { path: paths.trials.path, element: <RequireAuth><TrialsListPage /></RequireAuth> },
      { path: paths.newTrial.path, element: <RequireAuth roles={['COACH']}><NewTrialPage /></RequireAuth> },
      { path: paths.trial.path, element: <RequireAuth><TrialPage /></RequireAuth> },
      { path: paths.recordTrial.path, element: <RequireAuth roles={['COACH']}><RecordTrialPage /></RequireAuth> },
      { path: paths.handicapMarks.path, element: <RequireAuth roles={['ORGANISER']}><HandicapPage /></RequireAuth> },
      { path: paths.fieldNotes.path, element: <FieldNotesPage /> },
      { path: paths.newFieldNote.path, element: <RequireAuth roles={['COACH']}><NewFieldNotePage /></RequireAuth> },
      { path: paths.myFieldNotes.path, element: <RequireAuth roles={['COACH']}><MyFieldNotesPage /></RequireAuth> },
      { path: paths.fieldNotesReview.path, element: <RequireAuth roles={['ADMIN']}><FieldNotesReviewPage /></RequireAuth> },
      { path: paths.fieldNote.path, element: <FieldNotePage /> },
      { path: paths.editFieldNote.path, element: <RequireAuth roles={['COACH']}><EditFieldNotePage /></RequireAuth> },
      { path: paths.fieldNoteHistory.path, element: <RequireAuth><FieldNoteHistoryPage /></RequireAuth> },
      { path: paths.firstCuts.path, element: <FirstCutsPage /> },
      { path: paths.results.path, element: <ResultsExplorerPage /> },
      { path: paths.records.path, element: <RecordsPage /> },
      { path: paths.meetResults.path, element: <MeetResultsPage /> },
      // Organisers and the meet's appointed timekeepers: the page itself says who may post.
      { path: paths.postResults.path, element: <RequireAuth><PostResultsPage /></RequireAuth> },
      { path: paths.seasonStandings.path, element: <SeasonStandingsPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];
