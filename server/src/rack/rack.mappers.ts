import type { AxePhotoEntity } from './entities/axe-photo.entity.js';
import type { AxeServiceEntity, SetupChange } from './entities/axe-service.entity.js';
import type { AxeEntity } from './entities/axe.entity.js';
import { headGeometry } from './head-geometry.js';
import type { AxeModel, AxePhotoModel, AxeServiceModel, AxeSetupChangeModel } from './models/axe.model.js';
import { AxeServiceKindEnum, AxeStatusEnum, AxeUseEnum, GrindEnum } from './models/rack.enums.js';
import type { AxeStats } from './rack.repository.js';

export function toAxeModel(a: AxeEntity, stats: AxeStats | undefined): AxeModel {
  return {
    id: a.id,
    clubId: a.clubId,
    clubName: a.club?.name ?? '',
    label: a.label,
    maker: a.maker,
    headWeightG: a.headWeightG,
    bitWidthMm: a.bitWidthMm,
    grind: GrindEnum[a.grind],
    geometry: headGeometry(a.bevelIncludedDeg, a.chiselWidthMm),
    handleLengthMm: a.handleLengthMm,
    handleWood: a.handleWood,
    hangChecked: Boolean(a.hangChecked),
    pinned: Boolean(a.pinned),
    status: AxeStatusEnum[a.status],
    allowedFor: AxeUseEnum[a.allowedFor],
    isPublic: Boolean(a.isPublic),
    notes: a.notes,
    lastServicedOn: stats?.lastServicedOn ?? null,
    photoCount: stats?.photoCount ?? 0,
    updatedAt: a.updatedAt,
  };
}

const asText = (v: SetupChange['before']): string | null => (v === null ? null : String(v));

export function toSetupChangeModel(c: SetupChange): AxeSetupChangeModel {
  return { field: c.field, before: asText(c.before), after: asText(c.after) };
}

export function toServiceModel(s: AxeServiceEntity): AxeServiceModel {
  return {
    id: s.id,
    kind: AxeServiceKindEnum[s.kind],
    doneOn: s.doneOn,
    doneBy: s.doneBy,
    notes: s.notes,
    changes: (s.changes ?? []).map(toSetupChangeModel),
    loggedAt: s.createdAt,
  };
}

export function toPhotoModel(p: AxePhotoEntity, url: string): AxePhotoModel {
  return {
    id: p.id,
    url,
    thumbnailUrl: `${url}${url.includes('?') ? '&' : '?'}size=thumb`,
    width: p.width,
    height: p.height,
    mimeType: p.mimeType,
    byteSize: p.byteSize,
    caption: p.caption,
    uploadedAt: p.createdAt,
  };
}
