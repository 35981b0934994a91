import type { NoticeKind } from '../../shared/contract/notice-kinds';
import { Column, Entity, JoinColumn, ManyToOne } from 'typeorm';
import { LOT_NUMBER_MAX_LENGTH } from '../../shared/lot-number';
import type { TemperatureIndicator } from '../../shared/acceptance/types';
import type { LotStatus } from '../../shared/contract/lot-status';
import type { Verdict } from '../../shared/contract/verdicts';
import type { LotDecision, LotVerdict } from '../../shared/dock/verdict';
import { Base } from './base';
import { NullableText, NullableUuid, Text, Uuid } from './columns';
import { Connector, DipTube, DrumType, Slurry, Station, Supplier, TubeSet } from './registry';
import { User } from './user';

export type { Verdict } from '../../shared/contract/verdicts';

@Entity({ name: 'receiving_checks' })
export class ReceivingCheck extends Base {
  @Text('lot_number', LOT_NUMBER_MAX_LENGTH) lotNumber: string;
  /** A phone's key for a check it made offline (unique: a replay records nothing new). */
  @Column({ name: 'client_key', type: 'uuid', nullable: true }) clientKey: string | null;
  /** What the phone decided offline, for checks sent later: { decision, verdict, sentence, revision, madeAt }. */
  @Column({ name: 'provisional', type: 'jsonb', nullable: true }) provisional: Record<string, unknown> | null;
  @NullableUuid('supplier_id') supplierId: string | null;
  @ManyToOne(() => Supplier) @JoinColumn({ name: 'supplier_id' }) supplier?: Supplier | null;
  @NullableUuid('slurry_id') slurryId: string | null;
  @ManyToOne(() => Slurry) @JoinColumn({ name: 'slurry_id' }) slurry?: Slurry | null;
  @Column({ name: 'drum_count', type: 'integer' }) drumCount: number;
  @NullableUuid('drum_type_id') drumTypeId: string | null;
  @ManyToOne(() => DrumType) @JoinColumn({ name: 'drum_type_id' }) drumType?: DrumType | null;
  @Column({ name: 'drum_description', type: 'jsonb', nullable: true }) drumDescription: object | null;
  @NullableUuid('station_id') stationId: string | null;
  @ManyToOne(() => Station) @JoinColumn({ name: 'station_id' }) station?: Station | null;
  @Text('verdict', 8) verdict: Verdict;
  @Column({ name: 'result', type: 'jsonb' }) result: Record<string, unknown>;
  @Uuid('checked_by_id') checkedById: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'checked_by_id' }) checkedBy?: User;
  @Column({ name: 'production_date', type: 'date', nullable: true }) productionDate: string | null;
  @Column({ name: 'expiry_date', type: 'date', nullable: true }) expiryDate: string | null;
  @NullableText('temperature_indicator', 12) temperatureIndicator: TemperatureIndicator | null;
  /** The combined decision (hardware and lot acceptance) and what it was made of. */
  @Text('decision', 10, { default: 'accept' }) decision: LotDecision;
  @Column({ name: 'acceptance', type: 'jsonb', nullable: true }) acceptance: LotVerdict | null;
  /** The hold came from the rules (not typed by a person): a certificate attached later may lift it. */
  @Column({ name: 'held_by_rules', type: 'boolean', default: false }) heldByRules: boolean;
  @Text('status', 12, { default: 'checked' }) status: LotStatus;
  @NullableText('hold_reason', 2000) holdReason: string | null;
  @NullableUuid('held_by_id') heldById: string | null;
  @ManyToOne(() => User) @JoinColumn({ name: 'held_by_id' }) heldBy?: User | null;
  @Column({ name: 'held_at', type: 'timestamptz', nullable: true }) heldAt: Date | null;
  @NullableUuid('released_by_id') releasedById: string | null;
  @ManyToOne(() => User) @JoinColumn({ name: 'released_by_id' }) releasedBy?: User | null;
  @Column({ name: 'released_at', type: 'timestamptz', nullable: true }) releasedAt: Date | null;
  @NullableText('release_comment', 2000) releaseComment: string | null;
}

@Entity({ name: 'notifications' })
export class Notification extends Base {
  @Uuid('user_id') userId: string;
  @Text('kind', 20) kind: NoticeKind;
  @Text('title', 200) title: string;
  @Text('body', 4000) body: string;
  @NullableText('link', 300) link: string | null;
  @Column({ name: 'read_at', type: 'timestamptz', nullable: true }) readAt: Date | null;
}

@Entity({ name: 'sourcing_plans' })
export class SourcingPlan extends Base {
  @Text('slurry_name', 120) slurryName: string;
  @Uuid('supplier_id') supplierId: string;
  @ManyToOne(() => Supplier) @JoinColumn({ name: 'supplier_id' }) supplier?: Supplier;
  @Uuid('drum_type_id') drumTypeId: string;
  @ManyToOne(() => DrumType) @JoinColumn({ name: 'drum_type_id' }) drumType?: DrumType;
  @Column({ name: 'start_date', type: 'date' }) startDate: string;
  @Column({ name: 'drums_per_month', type: 'integer' }) drumsPerMonth: number;
  @Column({ name: 'station_ids', type: 'uuid', array: true }) stationIds: string[];
  @Column({ name: 'foams', type: 'boolean', default: false }) foams: boolean;
  @Column({ name: 'shear_sensitive', type: 'boolean', default: false }) shearSensitive: boolean;
  @NullableText('notes', 2000) notes: string | null;
  @Uuid('created_by_id') createdById: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'created_by_id' }) createdBy?: User;
}

@Entity({ name: 'hardware_warnings' })
export class HardwareWarning extends Base {
  @Text('source', 6) source: 'plan' | 'lot';
  @NullableUuid('sourcing_plan_id') sourcingPlanId: string | null;
  @ManyToOne(() => SourcingPlan, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'sourcing_plan_id' }) sourcingPlan?: SourcingPlan | null;
  @NullableUuid('receiving_check_id') receivingCheckId: string | null;
  @ManyToOne(() => ReceivingCheck, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'receiving_check_id' }) receivingCheck?: ReceivingCheck | null;
  @Text('status', 14, { default: 'open' }) status: 'open' | 'acknowledged' | 'resolved';
  @Text('summary', 1000) summary: string;
  @Column({ name: 'needs', type: 'jsonb' }) needs: unknown[];
  @NullableUuid('acknowledged_by_id') acknowledgedById: string | null;
  @ManyToOne(() => User) @JoinColumn({ name: 'acknowledged_by_id' }) acknowledgedBy?: User | null;
  @Column({ name: 'acknowledged_at', type: 'timestamptz', nullable: true }) acknowledgedAt: Date | null;
  @NullableUuid('resolved_by_id') resolvedById: string | null;
  @ManyToOne(() => User) @JoinColumn({ name: 'resolved_by_id' }) resolvedBy?: User | null;
  @Column({ name: 'resolved_at', type: 'timestamptz', nullable: true }) resolvedAt: Date | null;
}

@Entity({ name: 'rinse_log' })
export class RinseLog extends Base {
  @Uuid('tube_set_id') tubeSetId: string;
  @ManyToOne(() => TubeSet, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'tube_set_id' }) tubeSet?: TubeSet;
  @Uuid('rinsed_by_id') rinsedById: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'rinsed_by_id' }) rinsedBy?: User;
  @Column({ name: 'rinsed_at', type: 'timestamptz' }) rinsedAt: Date;
  @NullableText('note', 500) note: string | null;
}

@Entity({ name: 'change_outs' })
export class ChangeOut extends Base {
  @Uuid('station_id') stationId: string;
  @ManyToOne(() => Station, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'station_id' }) station?: Station;
  @Uuid('tube_set_id') tubeSetId: string;
  @ManyToOne(() => TubeSet) @JoinColumn({ name: 'tube_set_id' }) tubeSet?: TubeSet;
  @Uuid('dip_tube_id') dipTubeId: string;
  @ManyToOne(() => DipTube) @JoinColumn({ name: 'dip_tube_id' }) dipTube?: DipTube;
  @NullableUuid('connector_id') connectorId: string | null;
  @ManyToOne(() => Connector) @JoinColumn({ name: 'connector_id' }) connector?: Connector | null;
  @NullableUuid('receiving_check_id') receivingCheckId: string | null;
  @ManyToOne(() => ReceivingCheck) @JoinColumn({ name: 'receiving_check_id' }) receivingCheck?: ReceivingCheck | null;
  @NullableText('lot_number', LOT_NUMBER_MAX_LENGTH) lotNumber: string | null;
  @NullableText('drum_serial', 60) drumSerial: string | null;
  @NullableUuid('retired_tube_set_id') retiredTubeSetId: string | null;
  @ManyToOne(() => TubeSet) @JoinColumn({ name: 'retired_tube_set_id' }) retiredTubeSet?: TubeSet | null;
  @Uuid('by_id') byId: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'by_id' }) by?: User;
  @Column({ name: 'at', type: 'timestamptz' }) at: Date;
}
