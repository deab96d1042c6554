import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { isoDate, text } from '../league/league.validation.js';
import { setupChanges, setupValues, SETUP_FIELDS, type AxeSetup } from './axe-values.js';
import type { AxeServiceInput, AxeSetupChangeInput } from './dto/axe-service.input.js';
import type { AxeDetailModel } from './models/axe.model.js';
import { AxesService } from './axes.service.js';
import { assertCanEditAxe } from './rack-access.js';
import { optionalText } from './rack.validation.js';
import { RackRepository } from './rack.repository.js';

/** The service log: each entry says what was done and applies any setup it changed to the axe. */
@Injectable()
export class AxeServicesService {
  constructor(
    @Inject(RackRepository) private readonly repo: RackRepository,
    @Inject(AxesService) private readonly axes: AxesService,
  ) {}

  async log(actor: AuthUser, input: AxeServiceInput, now = new Date()): Promise<AxeDetailModel> {
    const axe = await this.axes.mustFind(input.axeId);
    assertCanEditAxe(actor, axe);
    const doneOn = isoDate('doneOn', 'Service date', input.doneOn);
    if (doneOn > now.toISOString().slice(0, 10)) throw DomainError.badInput('doneOn', 'A service cannot be dated in the future.');
    const before = axe as AxeSetup;
    const after = setupValues({ ...before, ...definedOnly(input.setup), ...(input.kind === 'RETIRE' ? { status: 'RETIRED' as const } : {}) });
    if (input.kind === 'RETIRE' && input.setup?.status && input.setup.status !== 'RETIRED') {
      throw DomainError.badInput('status', 'Retiring an axe sets its status to retired.');
    }
    const changes = setupChanges(before, after);
    if (changes.length > 0) {
      const latest = await this.repo.latestSetupDate(axe.id);
      if (latest !== null && doneOn < latest) {
        throw DomainError.badInput('doneOn', `The setup was last changed on ${latest}; a change dated earlier would overwrite a newer one. Date it ${latest} or later, or log it without setup changes.`);
      }
    }
    const doneBy = input.doneBy?.trim() ? text('doneBy', 'Done by', input.doneBy, 1, 80) : await this.repo.displayName(actor.id);
    await this.repo.db.transaction(async (m) => {
      await this.repo.services(m).insert({
        id: randomUUID(),
        axeId: axe.id,
        kind: input.kind,
        doneOn,
        doneBy,
        loggedBy: actor.id,
        notes: optionalText('notes', 'Notes', input.notes, 1000),
        changes,
      });
      if (changes.length > 0) await this.repo.axes(m).update({ id: axe.id }, after);
    });
    if (changes.length > 0) await this.axes.reindex(axe.id);
    return this.axes.detail(actor, axe.id, now);
  }
}

/** The setup fields the caller sent (null included: it clears a value); absent ones stay as they are. */
function definedOnly(setup: AxeSetupChangeInput | null | undefined): Partial<AxeSetup> {
  if (!setup) return {};
  const out: Record<string, unknown> = {};
  for (const field of SETUP_FIELDS) {
    if (field in setup && setup[field as keyof AxeSetupChangeInput] !== undefined) out[field] = setup[field as keyof AxeSetupChangeInput];
  }
  // Status, grind and use cannot be cleared; null there means "unchanged".
  for (const field of ['grind', 'status', 'allowedFor', 'hangChecked', 'pinned', 'handleWood'] as const) if (out[field] === null) delete out[field];
  return out as Partial<AxeSetup>;
}
