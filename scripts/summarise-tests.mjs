#!/usr/bin/env node
// Sums every suite's Jest JSON report and every check into one closing line.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const [dir, ...only] = process.argv.slice(2);
const suites = ['shared', 'search-fake', 'server', 'client', 'browser'];
// A run limited to some suites (`npm test -- browser`) expects only those.
const expected = only.length > 0 ? suites.filter((s) => only.includes(s)) : suites;
let passed = 0;
let failed = 0;
const lines = [];
for (const name of expected) {
  const file = join(dir, `${name}.json`);
  if (!existsSync(file)) { failed += 1; lines.push(`${name}: did not run (counted as one failure)`); continue; }
  const r = JSON.parse(readFileSync(file, 'utf8'));
  const broken = r.numRuntimeErrorTestSuites ?? 0;
  passed += r.numPassedTests;
  failed += r.numFailedTests + broken;
  lines.push(`${name}: ${r.numPassedTests} passed, ${r.numFailedTests} failed${broken ? `, ${broken} suites failed to run` : ''}`);
}
for (const f of readdirSync(dir).filter((f) => f.endsWith('.check')).sort()) {
  const ok = readFileSync(join(dir, f), 'utf8').trim() === 'pass';
  if (ok) passed += 1;
  else failed += 1;
  lines.push(`${f.replace(/\.check$/, '')}: ${ok ? 'passed' : 'FAILED'}`);
}
console.log(`\n${lines.join('\n')}\n`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
