import { QueryFailedError } from 'typeorm';
import { conflict, HttpError, ValidationFailed } from './errors';

/** Which request field a database constraint speaks for, so its violation can be answered like a validation error. */
const CONSTRAINT_FIELDS = new Map<string, string>(
  Object.entries({
    suppliers_name_key: 'name',
    thread_specs_code_key: 'code',
    key_codes_code_key: 'code',
    drum_types_part_key: 'partNumber',
    drum_types_depth_below_height: 'insideDepthMm',
    drum_openings_label_key: 'openings',
    dip_tubes_part_key: 'partNumber',
    dip_tubes_bore_inside_od: 'boreMm',
    connectors_part_key: 'partNumber',
    connectors_return_consistent: 'returnBoreMm',
    pairings_pair_key: 'connectorId',
    pairings_four_eyes: 'approver',
    slurries_name_key: 'name',
    slurries_remaining_within_life: 'minRemainingDays',
    slurries_storage_range: 'storageMaxC',
    stations_name_key: 'name',
    tube_sets_label_key: 'label',
    site_settings_clearance_window: 'tipClearanceMaxMm',
  }),
);

/** Maps unique, foreign-key and check violations to 409/400 naming the field; anything else is rethrown. */
export function translateDbError(err: unknown): never {
  if (err instanceof QueryFailedError) {
    const d = err.driverError as { code?: string; constraint?: string; detail?: string };
    const field = (d.constraint && CONSTRAINT_FIELDS.get(d.constraint)) || d.constraint || 'record';
    if (d.code === '23505') throw conflict(`That ${field} is already in use.`, [{ field, messages: ['is already in use'] }]);
    if (d.code === '23503') {
      throw new HttpError(409, 'in_use', 'This record is referred to by others (or refers to one that does not exist); change those first.', [{ field, messages: [d.detail ?? 'is referenced'] }]);
    }
    if (d.code === '23514') throw new ValidationFailed([{ field, messages: ['is not consistent with the other values'] }]);
    if (d.code === '22P02') throw new ValidationFailed([{ field: 'id', messages: ['is not a valid id'] }]);
  }
  throw err;
}
