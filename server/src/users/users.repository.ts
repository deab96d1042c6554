import { Inject, Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

import { ClubMembershipEntity } from './entities/club-membership.entity.js';
import { UserEntity } from './entities/user.entity.js';

/** The only place that queries users and memberships. */
@Injectable()
export class UsersRepository {
  constructor(@Inject(DataSource) private readonly db: DataSource) {}

  private users(manager?: EntityManager) {
    return (manager ?? this.db.manager).getRepository(UserEntity);
  }

  findById(id: string): Promise<UserEntity | null> {
    return this.users().findOne({ where: { id }, relations: { memberships: { club: true } } });
  }

  findByEmail(email: string): Promise<UserEntity | null> {
    return this.users().findOne({ where: { email } });
  }

  list(): Promise<UserEntity[]> {
    return this.users().find({ relations: { memberships: { club: true } }, order: { email: 'ASC' } });
  }

  save(user: UserEntity, manager?: EntityManager): Promise<UserEntity> {
    return this.users(manager).save(user);
  }

  create(values: Partial<UserEntity>): UserEntity {
    return this.users().create(values);
  }

  async clubIdsOf(userId: string): Promise<string[]> {
    const rows = await this.db.getRepository(ClubMembershipEntity).find({ where: { userId }, select: { clubId: true } });
    return rows.map((r) => r.clubId);
  }
}
