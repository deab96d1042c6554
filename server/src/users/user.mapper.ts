import { RoleEnum, UnitSystemEnum, type UserModel } from './models/user.model.js';
import type { UserEntity } from './entities/user.entity.js';

/** Entity → GraphQL model: only the listed fields leave the server (never the hash). */
export function toUserModel(user: UserEntity): UserModel {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: RoleEnum[user.role],
    emailVerified: user.emailVerifiedAt !== null,
    unitSystem: UnitSystemEnum[user.unitSystem],
    clubs: (user.memberships ?? []).map((m) => ({
      clubId: m.clubId,
      clubName: m.club?.name ?? '',
      role: RoleEnum[m.role],
    })),
  };
}
