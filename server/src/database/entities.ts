import { EmailTokenEntity } from '../auth/entities/email-token.entity.js';
import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { SeasonEntity } from '../league/entities/season.entity.js';
import { ClubMembershipEntity } from '../users/entities/club-membership.entity.js';
import { UserEntity } from '../users/entities/user.entity.js';

/** Every entity, listed (ESM has no __dirname globbing). */
export const ENTITIES = [UserEntity, ClubMembershipEntity, EmailTokenEntity, SeasonEntity, ClubEntity, AthleteEntity];
