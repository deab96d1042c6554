export * from './demo-league.js';
export * from './demo-meets.js';
