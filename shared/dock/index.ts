export * from './lot-status';
export * from './verdict';
