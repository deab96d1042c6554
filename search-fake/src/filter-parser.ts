import { filterSyntaxError, lexFilter, type FilterToken } from './filter-lexer.js';

export type CompareOp = '=' | '!=' | '>' | '>=' | '<' | '<=';

export type FilterNode =
  | { kind: 'and' | 'or'; items: FilterNode[] }
  | { kind: 'not'; item: FilterNode }
  | { kind: 'compare'; attribute: string; op: CompareOp; value: string }
  | { kind: 'range'; attribute: string; low: string; high: string }
  | { kind: 'in'; attribute: string; values: string[] }
  | { kind: 'exists'; attribute: string };

const KEYWORDS = new Set(['AND', 'OR', 'NOT', 'TO', 'IN', 'EXISTS']);

/** Parses one filter expression (recursive descent over the grammar in the search contract). */
export function parseFilter(expression: string): FilterNode {
  return new FilterParser(expression).parse();
}

class FilterParser {
  private readonly tokens: FilterToken[];
  private position = 0;

  constructor(private readonly expression: string) {
    this.tokens = lexFilter(expression);
  }

  parse(): FilterNode {
    if (this.peek().kind === 'end') throw this.fail('the filter is empty');
    const node = this.parseOr();
    if (this.peek().kind !== 'end') throw this.fail(`expected \`AND\`, \`OR\` or the end, found ${this.describe()}`);
    return node;
  }

  private parseOr(): FilterNode {
    const items = [this.parseAnd()];
    while (this.acceptKeyword('OR')) items.push(this.parseAnd());
    return items.length === 1 ? (items[0] as FilterNode) : { kind: 'or', items };
  }

  private parseAnd(): FilterNode {
    const items = [this.parseNot()];
    while (this.acceptKeyword('AND')) items.push(this.parseNot());
    return items.length === 1 ? (items[0] as FilterNode) : { kind: 'and', items };
  }

  private parseNot(): FilterNode {
    if (this.acceptKeyword('NOT')) return { kind: 'not', item: this.parseNot() };
    return this.parsePrimary();
  }

  private parsePrimary(): FilterNode {
    if (this.acceptPunct('(')) {
      const node = this.parseOr();
      if (!this.acceptPunct(')')) throw this.fail(`expected \`)\`, found ${this.describe()}`);
      return node;
    }
    const attribute = this.parseValue('an attribute name');
    const next = this.peek();
    if (next.kind === 'op') {
      this.position += 1;
      return { kind: 'compare', attribute, op: next.text as CompareOp, value: this.parseValue(`a value after \`${next.text}\``) };
    }
    const negated = this.acceptKeyword('NOT');
    if (this.acceptKeyword('IN')) return wrapNot(negated, { kind: 'in', attribute, values: this.parseList() });
    if (this.acceptKeyword('EXISTS')) return wrapNot(negated, { kind: 'exists', attribute });
    if (negated) throw this.fail(`expected \`IN\` or \`EXISTS\` after \`NOT\`, found ${this.describe()}`);
    if (this.isValue(next)) {
      const low = this.parseValue('a lower bound');
      if (!this.acceptKeyword('TO')) throw this.fail(`expected \`TO\` after the lower bound, found ${this.describe()}`);
      return { kind: 'range', attribute, low, high: this.parseValue('an upper bound after `TO`') };
    }
    throw this.fail(`expected an operator (=, !=, >, >=, <, <=, TO, IN, EXISTS) after \`${attribute}\`, found ${this.describe()}`);
  }

  private parseList(): string[] {
    if (!this.acceptPunct('[')) throw this.fail(`expected \`[\` after \`IN\`, found ${this.describe()}`);
    const values: string[] = [];
    while (!this.acceptPunct(']')) {
      values.push(this.parseValue('a value in the list'));
      if (this.acceptPunct(',')) continue;
      if (!this.acceptPunct(']')) throw this.fail(`expected \`,\` or \`]\`, found ${this.describe()}`);
      break;
    }
    return values;
  }

  private parseValue(what: string): string {
    const token = this.peek();
    if (!this.isValue(token)) throw this.fail(`expected ${what}, found ${this.describe()}`);
    this.position += 1;
    return token.text;
  }

  private isValue(token: FilterToken): boolean {
    return token.kind === 'quoted' || (token.kind === 'word' && !KEYWORDS.has(token.text));
  }

  private acceptKeyword(keyword: string): boolean {
    const token = this.peek();
    if (token.kind !== 'word' || token.text !== keyword) return false;
    this.position += 1;
    return true;
  }

  private acceptPunct(text: string): boolean {
    const token = this.peek();
    if (token.kind !== 'punct' || token.text !== text) return false;
    this.position += 1;
    return true;
  }

  private peek(): FilterToken {
    return this.tokens[this.position] as FilterToken;
  }

  private describe(): string {
    const token = this.peek();
    return token.kind === 'end' ? 'the end of the filter' : `\`${token.text}\``;
  }

  private fail(problem: string): Error {
    return filterSyntaxError(this.expression, this.peek().column, problem);
  }
}

function wrapNot(negated: boolean, node: FilterNode): FilterNode {
  return negated ? { kind: 'not', item: node } : node;
}
