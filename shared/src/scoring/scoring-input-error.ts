export type ScoringInputErrorCode = 'invalid-result' | 'duplicate-result' | 'invalid-option';

/** Input the engine cannot rank or score; `resultId` names the row when one is at fault. */
export class ScoringInputError extends Error {
  constructor(
    readonly code: ScoringInputErrorCode,
    message: string,
    readonly resultId: string | null = null,
  ) {
    super(message);
    this.name = 'ScoringInputError';
  }
}
