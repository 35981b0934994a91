// A station's rotation board (GET /stations/:id/board).
import type { FitRuleRecord, StationRecord, TubeSetState } from './records';

export interface BoardTubeSet {
  id: string;
  version: number;
  label: string;
  state: TubeSetState;
  dipTubeId: string;
  dipTubePartNumber: string | null;
  lastRinsedAt: string | null;
  lastRinsedByName: string | null;
  lastUsedAt: string | null;
  currentLotNumber: string | null;
  currentDrumSerial: string | null;
  currentReceivingCheckId: string | null;
  /** Whether the set may go into the next drum, by the shared rinse rule. */
  rinse: FitRuleRecord;
}

/** A change-out: a set went online in a station's drum; the board lists a station's, a lot lists those of its drums. */
export interface ChangeOutRecord {
  id: string;
  at: string;
  stationId: string;
  stationName: string | null;
  tubeSetId: string;
  tubeSetLabel: string | null;
  dipTubePartNumber: string | null;
  connectorPartNumber: string | null;
  lotNumber: string | null;
  receivingCheckId: string | null;
  drumSerial: string | null;
  /** The set that came out of the emptied drum for cleaning, if one was online. */
  retiredTubeSetLabel: string | null;
  byName: string | null;
}

export interface BoardRinse {
  id: string;
  at: string;
  tubeSetLabel: string | null;
  byName: string | null;
  note: string | null;
}

export interface StationBoard {
  station: Pick<StationRecord, 'id' | 'version' | 'name' | 'bay' | 'tapping' | 'agitation' | 'flowLpm' | 'connectorId' | 'connectorPartNumber'>;
  tubeSets: BoardTubeSet[];
  changeOuts: ChangeOutRecord[];
  rinses: BoardRinse[];
}
