export * from './is-allowed.js';
export * from './password-policy.js';
export * from './roles.js';
