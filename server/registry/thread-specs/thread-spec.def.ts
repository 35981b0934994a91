import type { ThreadSpecRow } from '../../../shared/threads/thread-table';
import { ThreadSpec } from '../../entities';
import { THREAD_FAMILIES } from '../../entities/registry';
import { filter, stamps } from '../common';
import { oneOf } from '../list-query';
import { pick } from '../refs';
import { ThreadSpecDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { ThreadSpecRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

/** A stored thread spec as a row of the thread table (the shape the shared thread code works on). */
export const threadRow = (t: ThreadSpec): ThreadSpecRow => copyOf(t, ['code', 'family', 'nominalLabel', 'majorDiameterMm', 'pitchMm', 'threadsPerInch', 'flankAngleDeg', 'form', 'standard']);

export const threadSpecDef: ResourceDef<ThreadSpec> = {
  path: 'thread-specs',
  label: 'Thread spec',
  entity: ThreadSpec,
  alias: 't',
  dto: ThreadSpecDto,
  joins: (qb) => qb,
  search: ['t.code', 't.nominal_label', 't.standard'],
  sorts: { code: 't.code', family: 't.family', majorDiameterMm: 't.majorDiameterMm' },
  defaultSort: 'majorDiameterMm',
  // On the thread table, ?thread= is the family.
  filters: { thread: filter(oneOf(THREAD_FAMILIES), (qb, v) => qb.andWhere('t.family = :family', { family: v })) },
  toJson: (t): Sent<ThreadSpecRecord> => ({ ...stamps(t), ...threadRow(t) }),
  toColumns: async (dto) => pick<ThreadSpec>(dto, ['code', 'family', 'nominalLabel', 'majorDiameterMm', 'pitchMm', 'threadsPerInch', 'flankAngleDeg', 'form', 'standard']),
};
