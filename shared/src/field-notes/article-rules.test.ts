import { describe, expect, it } from '@jest/globals';

import { canEditArticle, canSubmitArticle, canWriteArticles, publishRefusal, type ArticleFacts } from './article-rules.js';

const coach = { id: 'coach-1', role: 'COACH' as const, clubIds: ['club-a'] };
const otherCoach = { id: 'coach-2', role: 'COACH' as const, clubIds: ['club-b'] };
const admin = { id: 'admin-1', role: 'ADMIN' as const };
const athlete = { id: 'athlete-1', role: 'ATHLETE' as const, clubIds: ['club-a'] };
const finding = (over: Partial<ArticleFacts> = {}): ArticleFacts => ({ kind: 'FINDING', status: 'IN_REVIEW', authorId: coach.id, ...over });

describe('Field Notes workflow permissions', () => {
  it('lets coaches and admins write, not athletes, organisers or visitors', () => {
    expect(canWriteArticles(coach)).toBe(true);
    expect(canWriteArticles(admin)).toBe(true);
    expect(canWriteArticles(athlete)).toBe(false);
    expect(canWriteArticles({ role: 'ORGANISER' })).toBe(false);
    expect(canWriteArticles(null)).toBe(false);
  });

  it('keeps an author to their own notes, and locks a note while it is in review', () => {
    expect(canEditArticle(coach, finding({ status: 'DRAFT' }))).toBe(true);
    expect(canEditArticle(otherCoach, finding({ status: 'DRAFT' }))).toBe(false);
    expect(canEditArticle(coach, finding({ status: 'IN_REVIEW' }))).toBe(false);
    expect(canEditArticle(coach, finding({ status: 'PUBLISHED' }))).toBe(true);
    expect(canEditArticle(admin, finding({ status: 'IN_REVIEW' }))).toBe(true);
  });

  it('submits only drafts', () => {
    expect(canSubmitArticle(coach, finding({ status: 'DRAFT' }))).toBe(true);
    expect(canSubmitArticle(coach, finding({ status: 'PUBLISHED' }))).toBe(false);
  });

  it('refuses an athlete publishing', () => {
    expect(publishRefusal(athlete, finding())).toMatch(/administrator/);
  });

  it('refuses a coach publishing their own finding', () => {
    expect(publishRefusal(coach, finding())).toMatch(/administrator/);
  });

  it('refuses an admin publishing a finding they wrote, but not a guide they wrote', () => {
    expect(publishRefusal(admin, finding({ authorId: admin.id }))).toMatch(/second pair of eyes/);
    expect(publishRefusal(admin, finding({ authorId: admin.id, kind: 'GUIDE' }))).toBeNull();
  });

  it("lets an admin publish someone else's finding once it is in review", () => {
    expect(publishRefusal(admin, finding())).toBeNull();
    expect(publishRefusal(admin, finding({ status: 'DRAFT' }))).toMatch(/review first/);
  });
});
