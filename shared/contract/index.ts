// The API's contract: the JSON shapes the server answers with and the literal lists both sides speak
// (roles and what each may do, verdicts, lot statuses, notice kinds, units), each defined once.
export * from './lot-status';
export * from './notice-kinds';
export * from './records';
export * from './roles';
export * from './units';
export * from './verdicts';
