// The API's contract: the JSON shapes the server answers with and the literal lists both sides speak
// (roles and what each may do, verdicts, lot statuses, notice kinds, units), each defined once.
export * from './attachments';
export * from './dock';
export * from './imports';
export * from './lot-status';
export * from './notice-kinds';
export * from './notifications';
export * from './receiving';
export * from './records';
export * from './roles';
export * from './sourcing';
export * from './stations';
export * from './tools';
export * from './units';
export * from './users';
export * from './verdicts';
export * from './wire';
