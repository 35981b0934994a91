export * from './types';
export * from './rules';
export * from './evaluate';
export * from './handling';
