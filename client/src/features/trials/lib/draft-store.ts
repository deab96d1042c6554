import type { TrialDraft } from './trial-draft.js';

const PREFIX = 'endgrain.trial-draft.';

/**
 * Trial drafts kept on this device (localStorage), so a lost connection or a closed tab loses
 * nothing; each draft is its own key, so two tabs on different trials do not overwrite each other.
 */
export const draftStore = {
  load(id: string): TrialDraft | null {
    const raw = window.localStorage.getItem(PREFIX + id);
    if (!raw) return null;
    try {
      return JSON.parse(raw) as TrialDraft;
    } catch {
      return null;
    }
  },
  save(draft: TrialDraft): void {
    window.localStorage.setItem(PREFIX + draft.id, JSON.stringify(draft));
  },
  remove(id: string): void {
    window.localStorage.removeItem(PREFIX + id);
  },
  /** Drafts of one club that have not reached the server yet, newest change first. */
  unsent(clubId: string): TrialDraft[] {
    const drafts: TrialDraft[] = [];
    for (let i = 0; i < window.localStorage.length; i += 1) {
      const key = window.localStorage.key(i);
      if (!key?.startsWith(PREFIX)) continue;
      const draft = draftStore.load(key.slice(PREFIX.length));
      if (draft && draft.clubId === clubId && draft.sync !== 'sent') drafts.push(draft);
    }
    return drafts.sort((a, b) => b.changedAt.localeCompare(a.changedAt));
  },
};
