export * from './factors.js';
export * from './disc.js';
export * from './stack.js';
export * from './back-off.js';
export * from './curve.js';
export * from './validate.js';
export * from './stack-derivation.js';
export * from './standard-sizes.js';
