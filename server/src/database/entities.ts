import { EmailTokenEntity } from '../auth/entities/email-token.entity.js';
import { ArticleImageEntity } from '../field-notes/entities/article-image.entity.js';
import { ArticleReviewEntity } from '../field-notes/entities/article-review.entity.js';
import { ArticleRevisionEntity } from '../field-notes/entities/article-revision.entity.js';
import { ArticleEntity } from '../field-notes/entities/article.entity.js';
import { FirstCutsStepEntity } from '../field-notes/entities/first-cuts-step.entity.js';
import { ReadingProgressEntity } from '../field-notes/entities/reading-progress.entity.js';
import { HandicapMarkEntity } from '../insights/entities/handicap-mark.entity.js';
import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubInvitationEntity } from '../league/entities/club-invitation.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { SeasonEntity } from '../league/entities/season.entity.js';
import { EntryAthleteEntity } from '../meets/entities/entry-athlete.entity.js';
import { EntryEntity } from '../meets/entities/entry.entity.js';
import { EventTypeEntity } from '../meets/entities/event-type.entity.js';
import { MeetChangeEntity } from '../meets/entities/meet-change.entity.js';
import { MeetEventEntity } from '../meets/entities/meet-event.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';
import { MeetTimekeeperEntity } from '../meets/entities/meet-timekeeper.entity.js';
import { AxePhotoEntity } from '../rack/entities/axe-photo.entity.js';
import { AxeServiceEntity } from '../rack/entities/axe-service.entity.js';
import { AxeEntity } from '../rack/entities/axe.entity.js';
import { LineupAssignmentEntity } from '../rack/entities/lineup-assignment.entity.js';
import { LineupOverrideEntity } from '../rack/entities/lineup-override.entity.js';
import { MeetStandingEntity } from '../results/entities/meet-standing.entity.js';
import { ResultAuditEntity } from '../results/entities/result-audit.entity.js';
import { ResultEntity } from '../results/entities/result.entity.js';
import { SearchOutboxEntity } from '../search/entities/search-outbox.entity.js';
import { TrialRunEntity } from '../trials/entities/trial-run.entity.js';
import { TrialSummaryEntity } from '../trials/entities/trial-summary.entity.js';
import { TrialTesterEntity } from '../trials/entities/trial-tester.entity.js';
import { TrialEntity } from '../trials/entities/trial.entity.js';
import { ClubMembershipEntity } from '../users/entities/club-membership.entity.js';
import { UserEntity } from '../users/entities/user.entity.js';

/** Every entity, listed (ESM has no __dirname globbing). */
export const ENTITIES = [
  UserEntity,
  ClubMembershipEntity,
  EmailTokenEntity,
  SeasonEntity,
  ClubEntity,
  AthleteEntity,
  ClubInvitationEntity,
  EventTypeEntity,
  MeetEntity,
  MeetEventEntity,
  EntryEntity,
  EntryAthleteEntity,
  MeetChangeEntity,
  MeetTimekeeperEntity,
  AxeEntity,
  AxeServiceEntity,
  AxePhotoEntity,
  LineupAssignmentEntity,
  LineupOverrideEntity,
  ResultEntity,
  MeetStandingEntity,
  ResultAuditEntity,
  ArticleEntity,
  ArticleRevisionEntity,
  ArticleReviewEntity,
  FirstCutsStepEntity,
  ReadingProgressEntity,
  ArticleImageEntity,
  SearchOutboxEntity,
  HandicapMarkEntity,
  TrialEntity,
  TrialTesterEntity,
  TrialRunEntity,
  TrialSummaryEntity,
];
