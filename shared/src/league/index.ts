export * from './check-entry.js';
export * from './divisions.js';
export * from './draw-order.js';
export * from './event-catalogue.js';
export * from './meet-status.js';
