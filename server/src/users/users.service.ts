import { Inject, Injectable } from '@nestjs/common';
import { ROLES, type Role } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';
import type { UnitSystemValue } from './entities/user.entity.js';
import type { UserModel } from './models/user.model.js';
import { toUserModel } from './user.mapper.js';
import { UsersRepository } from './users.repository.js';

@Injectable()
export class UsersService {
  constructor(@Inject(UsersRepository) private readonly users: UsersRepository) {}

  async getModel(id: string): Promise<UserModel> {
    const user = await this.users.findById(id);
    if (!user) throw DomainError.notFound('That account');
    return toUserModel(user);
  }

  async list(): Promise<UserModel[]> {
    return (await this.users.list()).map(toUserModel);
  }

  async setRole(actorId: string, userId: string, role: Role): Promise<UserModel> {
    if (!ROLES.includes(role)) throw DomainError.badInput('role', `Unknown role "${role}".`);
    if (actorId === userId && role !== 'ADMIN') {
      throw DomainError.badInput('role', 'You cannot remove your own admin role; ask another admin.');
    }
    const user = await this.users.findById(userId);
    if (!user) throw DomainError.notFound('That account');
    user.role = role;
    user.tokenVersion += 1; // existing tokens carry the old role: end them
    await this.users.save(user);
    return toUserModel(user);
  }

  async updatePreferences(
    userId: string,
    changes: { displayName?: string | null; unitSystem?: UnitSystemValue | null },
  ): Promise<UserModel> {
    const user = await this.users.findById(userId);
    if (!user) throw DomainError.notFound('That account');
    if (changes.displayName != null) user.displayName = validDisplayName(changes.displayName);
    if (changes.unitSystem != null) user.unitSystem = changes.unitSystem;
    await this.users.save(user);
    return toUserModel(user);
  }
}

export function validDisplayName(raw: string): string {
  const name = raw.trim().replace(/\s+/g, ' ');
  if (name.length < 2) throw DomainError.badInput('displayName', 'Display name must be at least 2 characters.');
  if (name.length > 80) throw DomainError.badInput('displayName', 'Display name must be at most 80 characters.');
  return name;
}
