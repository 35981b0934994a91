// Spec-sheet imports as the API answers them (POST /imports, GET /imports, GET /imports/:id).

/** The registry tables a spec sheet can fill; each is also that table's API path and query key. */
export const IMPORT_KINDS = ['drum-types', 'dip-tubes', 'connectors'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];

export type ImportOutcome = 'dry-run' | 'committed' | 'refused';

export interface ImportCounts {
  new: number;
  changed: number;
  unchanged: number;
  rejected: number;
}

export interface ImportRowError {
  line: number;
  column: string;
  reason: string;
}

export interface ImportPlannedRow {
  line: number;
  action: 'new' | 'changed' | 'unchanged';
  partNumber: string;
  supplierId: string;
}

/** What a run and its record both carry. */
interface ImportSummary {
  id: string;
  kind: ImportKind;
  fileName: string;
  dryRun: boolean;
  outcome: ImportOutcome;
  encoding: string;
  counts: ImportCounts;
  errors: ImportRowError[];
  attachmentId: string | null;
}

/** The answer to POST /imports: a dry run, a commit, or (in a 422's details) a refused commit. */
export interface ImportRun extends ImportSummary {
  delimiter: ',' | ';';
  header: string[];
  ignoredColumns: string[];
  /** The first 200 planned rows. */
  rows: ImportPlannedRow[];
}

/** One past import (GET /imports lists them with at most 50 errors each; GET /imports/:id has them all). Dry runs are kept too. */
export interface ImportHistoryItem extends ImportSummary {
  delimiter: string;
  byName: string | null;
  at: string;
}
