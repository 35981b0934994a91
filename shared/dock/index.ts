export * from '../contract/lot-status';
export * from './verdict';
