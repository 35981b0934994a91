// Sourcing plans and hardware warnings as the API answers them (GET/POST /sourcing-plans, GET /warnings).
import type { OrderLine, Region, StationNeed } from './records';

export interface SourcingPlanRecord {
  id: string;
  version: number;
  slurryName: string;
  supplierId: string;
  supplierName: string | null;
  region: Region | null;
  drumTypeId: string;
  drumTypeName: string | null;
  drumTypePartNumber: string | null;
  startDate: string;
  drumsPerMonth: number;
  stationIds: string[];
  foams: boolean;
  shearSensitive: boolean;
  notes: string | null;
  createdByName: string | null;
  createdAt: string;
}

export interface SourcingPlanDetail extends SourcingPlanRecord {
  impact: { stations: StationNeed[]; order: OrderLine[] };
  warnings: HardwareWarningRecord[];
}

export const WARNING_STATUSES = ['open', 'acknowledged', 'resolved'] as const;
export type WarningStatus = (typeof WARNING_STATUSES)[number];

/** A plan or a held lot that needs hardware the site lacks. */
export interface HardwareWarningRecord {
  id: string;
  version: number;
  source: 'plan' | 'lot';
  sourcingPlanId: string | null;
  receivingCheckId: string | null;
  lotNumber: string | null;
  planSlurryName: string | null;
  status: WarningStatus;
  summary: string;
  needs: Array<{ stations: StationNeed[]; order: OrderLine[] }>;
  acknowledgedByName: string | null;
  acknowledgedAt: string | null;
  resolvedByName: string | null;
  resolvedAt: string | null;
  createdAt: string;
}
