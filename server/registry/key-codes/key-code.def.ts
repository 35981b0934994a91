import { KeyCode } from '../../entities';
import { stamps } from '../common';
import { pick } from '../refs';
import { KeyCodeDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { KeyCodeRecord } from '../../../shared/contract/records';
import { copyOf, type Sent } from '../../common/json';

export const keyCodeDef: ResourceDef<KeyCode> = {
  path: 'key-codes',
  label: 'Key code',
  entity: KeyCode,
  alias: 'k',
  dto: KeyCodeDto,
  joins: (qb) => qb,
  search: ['k.code', 'k.label', "coalesce(k.marking, '')"],
  sorts: { code: 'k.code', label: 'k.label' },
  defaultSort: 'code',
  toJson: (k): Sent<KeyCodeRecord> => ({ ...stamps(k), ...copyOf(k, ['code', 'label', 'marking']) }),
  toColumns: async (dto) => pick<KeyCode>(dto, ['code', 'label', 'marking']),
};
