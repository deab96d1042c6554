export * from './demo-league.js';
