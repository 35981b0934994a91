export * from '../dates';
export * from './types';
export * from './rules';
