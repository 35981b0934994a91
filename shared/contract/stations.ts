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

export interface BoardChangeOut {
  id: string;
  at: string;
  tubeSetLabel: string | null;
  dipTubePartNumber: string | null;
  connectorPartNumber: string | null;
  lotNumber: string | null;
  receivingCheckId: string | null;
  drumSerial: string | null;
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
  changeOuts: BoardChangeOut[];
  rinses: BoardRinse[];
}
