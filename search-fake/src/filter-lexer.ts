import { ApiError } from './api-error.js';

export type FilterTokenKind = 'word' | 'quoted' | 'op' | 'punct' | 'end';

export interface FilterToken {
  kind: FilterTokenKind;
  text: string;
  /** 1-based column, for messages that point at the trouble. */
  column: number;
}

const OPERATORS = ['!=', '>=', '<=', '=', '>', '<'];
const PUNCTUATION = new Set(['(', ')', '[', ']', ',']);
const WORD_CHAR = /[\p{L}\p{N}_.-]/u;

export function filterSyntaxError(expression: string, column: number, problem: string): ApiError {
  return new ApiError(
    'invalid_search_filter',
    `Filter \`${expression}\` does not parse at character ${column}: ${problem}.`,
  );
}

/** Splits a filter expression into words, quoted values, operators and brackets. */
export function lexFilter(expression: string): FilterToken[] {
  const tokens: FilterToken[] = [];
  let i = 0;
  while (i < expression.length) {
    const ch = expression[i] as string;
    const column = i + 1;
    if (/\s/u.test(ch)) {
      i += 1;
    } else if (ch === "'" || ch === '"') {
      const { text, next } = readQuoted(expression, i);
      tokens.push({ kind: 'quoted', text, column });
      i = next;
    } else if (PUNCTUATION.has(ch)) {
      tokens.push({ kind: 'punct', text: ch, column });
      i += 1;
    } else {
      const op = OPERATORS.find((candidate) => expression.startsWith(candidate, i));
      if (op !== undefined) {
        tokens.push({ kind: 'op', text: op, column });
        i += op.length;
      } else if (WORD_CHAR.test(ch)) {
        let end = i;
        while (end < expression.length && WORD_CHAR.test(expression[end] as string)) end += 1;
        tokens.push({ kind: 'word', text: expression.slice(i, end), column });
        i = end;
      } else {
        throw filterSyntaxError(expression, column, `unexpected character \`${ch}\``);
      }
    }
  }
  tokens.push({ kind: 'end', text: '', column: expression.length + 1 });
  return tokens;
}

function readQuoted(expression: string, start: number): { text: string; next: number } {
  const quote = expression[start];
  let text = '';
  let i = start + 1;
  while (i < expression.length) {
    const ch = expression[i] as string;
    if (ch === '\\' && i + 1 < expression.length) {
      text += expression[i + 1];
      i += 2;
    } else if (ch === quote) {
      return { text, next: i + 1 };
    } else {
      text += ch;
      i += 1;
    }
  }
  throw filterSyntaxError(expression, start + 1, `the quote opened here is never closed`);
}
