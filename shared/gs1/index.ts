// GS1 element strings on drum labels: the one home of the parser (see drum-label.ts).
export { parseDrumLabel, type DrumLabel } from './drum-label';
export { gs1CheckDigit, hasValidCheckDigit } from './check-digit';
export { gs1Year, parseGs1Date } from './dates';
