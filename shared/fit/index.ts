export * from './types';
export * from './rules';
export * from './registry';
export * from './evaluate';
export * from './handling';
