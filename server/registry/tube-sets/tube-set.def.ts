import { tubeSetEditProblem } from '../../../shared/records/tube-set';
import { fieldError } from '../../common/errors';
import { DipTube, Station, TubeSet } from '../../entities';
import { TUBE_SET_STATES } from '../../entities/registry';
import { filter, stamps } from '../common';
import { anId, oneOf } from '../list-query';
import { ensureExists, pick } from '../refs';
import { TubeSetDto } from '../registry.dto';
import type { ResourceDef } from '../resource';
import type { TubeSetRecord } from '../../../shared/contract/records';
import { copyOf, nameOf, type Sent } from '../../common/json';

export const tubeSetDef: ResourceDef<TubeSet> = {
  path: 'tube-sets',
  label: 'Tube set',
  entity: TubeSet,
  alias: 'ts',
  dto: TubeSetDto,
  joins: (qb) => qb.leftJoinAndSelect('ts.station', 'st').leftJoinAndSelect('ts.dipTube', 't').leftJoinAndSelect('ts.lastRinsedBy', 'rb'),
  search: ['ts.label', 'st.name', 't.part_number'],
  sorts: { label: 'ts.label', station: 'st.name', state: 'ts.state', lastRinsedAt: 'ts.lastRinsedAt' },
  defaultSort: 'station',
  filters: {
    stationId: filter(anId, (qb, v) => qb.andWhere('ts.station_id = :stationId', { stationId: v })),
    // On tube sets, ?status= is the set's state in the rotation.
    status: filter(oneOf(TUBE_SET_STATES), (qb, v) => qb.andWhere('ts.state = :state', { state: v })),
  },
  toJson: (t): Sent<TubeSetRecord> => ({
    ...stamps(t),
    ...copyOf(t, ['currentLotNumber', 'currentDrumSerial', 'stationId', 'label', 'dipTubeId', 'state', 'lastRinsedAt', 'lastRinsedById', 'lastUsedAt']),
    stationName: t.station?.name ?? null,
    dipTubePartNumber: t.dipTube?.partNumber ?? null,
    lastRinsedByName: nameOf(t.lastRinsedBy),
  }),
  toColumns: async (dto, { manager, existing }) => {
    if (dto.stationId !== undefined) await ensureExists(manager, Station, dto.stationId, 'stationId', 'station');
    if (dto.dipTubeId !== undefined) await ensureExists(manager, DipTube, dto.dipTubeId, 'dipTubeId', 'dip tube');
    const cols = pick<TubeSet>(dto, ['stationId', 'label', 'dipTubeId']);
    if (existing) {
      const problem = tubeSetEditProblem(dto, existing as TubeSet);
      if (problem) throw fieldError(problem.field, problem.says);
      return cols;
    }
    return { ...cols, state: 'cleaning', lastRinsedAt: null, lastUsedAt: null };
  },
};
