import { Column, Entity, JoinColumn, ManyToOne, OneToMany } from 'typeorm';
import { LOT_NUMBER_MAX_LENGTH } from '../../shared/lot-number';
import { Base } from './base';
import { Bool, Float, NullableFloat, NullableText, NullableUuid, Text, Uuid } from './columns';
import { User } from './user';
import type { Oxidiser } from '../../shared/wetted-materials';
import type { ViscosityModel } from '../../shared/records/slurry';

export const REGIONS = ['NA', 'EU', 'JP', 'TW', 'KR', 'CN', 'SG', 'other'] as const;
export type Region = (typeof REGIONS)[number];
// The closed sets that DTOs validate and list filters accept, with the columns typed from them.
export const THREAD_FAMILIES = ['NPS', 'NPT', 'G', 'R', 'Rc', 'Rp', 'buttress', 'other'] as const;
export const SUITED_TO = ['two-opening', 'one-opening', 'both'] as const;
export const PAIRING_STATUSES = ['draft', 'approved', 'retired'] as const;
export const TUBE_SET_STATES = ['online', 'standby', 'cleaning', 'ready'] as const;

@Entity({ name: 'suppliers' })
export class Supplier extends Base {
  @Text('name', 120) name: string;
  @Text('region', 8) region: Region;
  @NullableText('contact_email', 254) contactEmail: string | null;
  @NullableText('notes', 2000) notes: string | null;
}

@Entity({ name: 'thread_specs' })
export class ThreadSpec extends Base {
  @Text('code', 40) code: string;
  @Text('family', 12) family: (typeof THREAD_FAMILIES)[number];
  @Text('nominal_label', 40) nominalLabel: string;
  @Float('major_diameter_mm') majorDiameterMm: number;
  @Float('pitch_mm') pitchMm: number;
  @Float('threads_per_inch') threadsPerInch: number;
  @Float('flank_angle_deg') flankAngleDeg: number;
  @Text('form', 10) form: 'tapered' | 'parallel';
  @Text('standard', 200) standard: string;
}

@Entity({ name: 'key_codes' })
export class KeyCode extends Base {
  @Text('code', 40) code: string;
  @Text('label', 120) label: string;
  @NullableText('marking', 200) marking: string | null;
}

@Entity({ name: 'drum_types' })
export class DrumType extends Base {
  @Uuid('supplier_id') supplierId: string;
  @ManyToOne(() => Supplier, { onDelete: 'RESTRICT' }) @JoinColumn({ name: 'supplier_id' }) supplier?: Supplier;
  @Text('region', 8) region: Region;
  @Text('name', 120) name: string;
  @Text('part_number', 60) partNumber: string;
  @Float('nominal_capacity_l') nominalCapacityL: number;
  @Text('material', 12) material: 'steel' | 'plastic' | 'fibre' | 'aluminium' | 'other';
  @Text('head', 6) head: 'tight' | 'open';
  @NullableText('un_packaging_code', 40) unPackagingCode: string | null;
  @Float('outside_height_mm') outsideHeightMm: number;
  @Float('inside_depth_mm') insideDepthMm: number;
  @Float('outside_diameter_mm') outsideDiameterMm: number;
  /** For the heel and run time (shared/heel.ts); null when not registered. */
  @NullableFloat('inside_diameter_mm') insideDiameterMm: number | null;
  @OneToMany(() => DrumOpening, (o) => o.drumType, { cascade: true }) openings?: DrumOpening[];
}

@Entity({ name: 'drum_openings' })
export class DrumOpening extends Base {
  @Uuid('drum_type_id') drumTypeId: string;
  @ManyToOne(() => DrumType, (d) => d.openings, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'drum_type_id' }) drumType?: DrumType;
  @Text('label', 40) label: string;
  @Uuid('thread_spec_id') threadSpecId: string;
  @ManyToOne(() => ThreadSpec) @JoinColumn({ name: 'thread_spec_id' }) threadSpec?: ThreadSpec;
  @Float('bore_mm') boreMm: number;
  @NullableUuid('key_code_id') keyCodeId: string | null;
  @ManyToOne(() => KeyCode) @JoinColumn({ name: 'key_code_id' }) keyCode?: KeyCode | null;
  @Text('position', 20) position: 'large' | 'small' | 'center' | 'other';
}

@Entity({ name: 'dip_tubes' })
export class DipTube extends Base {
  @Text('part_number', 60) partNumber: string;
  @Uuid('supplier_id') supplierId: string;
  @ManyToOne(() => Supplier) @JoinColumn({ name: 'supplier_id' }) supplier?: Supplier;
  @Uuid('thread_spec_id') threadSpecId: string;
  @ManyToOne(() => ThreadSpec) @JoinColumn({ name: 'thread_spec_id' }) threadSpec?: ThreadSpec;
  @Float('length_mm') lengthMm: number;
  @Float('bore_mm') boreMm: number;
  @Float('od_mm') odMm: number;
  @Text('material', 40) material: string;
  @NullableUuid('key_code_id') keyCodeId: string | null;
  @ManyToOne(() => KeyCode) @JoinColumn({ name: 'key_code_id' }) keyCode?: KeyCode | null;
  @Text('channels', 12) channels: 'feed' | 'feed-return';
}

@Entity({ name: 'connectors' })
export class Connector extends Base {
  @Text('part_number', 60) partNumber: string;
  @Uuid('supplier_id') supplierId: string;
  @ManyToOne(() => Supplier) @JoinColumn({ name: 'supplier_id' }) supplier?: Supplier;
  @NullableUuid('key_code_id') keyCodeId: string | null;
  @ManyToOne(() => KeyCode) @JoinColumn({ name: 'key_code_id' }) keyCode?: KeyCode | null;
  @Float('feed_bore_mm') feedBoreMm: number;
  @Text('feed_nominal', 20) feedNominal: string;
  @NullableFloat('return_bore_mm') returnBoreMm: number | null;
  @NullableText('return_nominal', 20) returnNominal: string | null;
  @Text('return_path', 12) returnPath: 'none' | 'restricted' | 'open';
  @Text('suited_to', 12) suitedTo: (typeof SUITED_TO)[number];
  @Text('wetted_materials', 200) wettedMaterials: string;
}

@Entity({ name: 'pairings' })
export class Pairing extends Base {
  @Uuid('dip_tube_id') dipTubeId: string;
  @ManyToOne(() => DipTube) @JoinColumn({ name: 'dip_tube_id' }) dipTube?: DipTube;
  @Uuid('connector_id') connectorId: string;
  @ManyToOne(() => Connector) @JoinColumn({ name: 'connector_id' }) connector?: Connector;
  @Text('status', 10) status: (typeof PAIRING_STATUSES)[number];
  @Uuid('author_id') authorId: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'author_id' }) author?: User;
  @NullableUuid('approver_id') approverId: string | null;
  @ManyToOne(() => User) @JoinColumn({ name: 'approver_id' }) approver?: User | null;
  @Column({ name: 'approved_at', type: 'timestamptz', nullable: true }) approvedAt: Date | null;
  @NullableText('notes', 2000) notes: string | null;
  @OneToMany(() => PairingReview, (r) => r.pairing) reviews?: PairingReview[];
}

@Entity({ name: 'pairing_reviews' })
export class PairingReview extends Base {
  @Uuid('pairing_id') pairingId: string;
  @ManyToOne(() => Pairing, (p) => p.reviews, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'pairing_id' }) pairing?: Pairing;
  @Uuid('reviewer_id') reviewerId: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'reviewer_id' }) reviewer?: User;
  @Text('decision', 10) decision: 'approved' | 'rejected' | 'retired';
  @Text('comment', 2000) comment: string;
}

@Entity({ name: 'slurries' })
export class Slurry extends Base {
  @Text('name', 120) name: string;
  @Uuid('supplier_id') supplierId: string;
  @ManyToOne(() => Supplier) @JoinColumn({ name: 'supplier_id' }) supplier?: Supplier;
  @Text('region', 8) region: Region;
  @Uuid('drum_type_id') drumTypeId: string;
  @ManyToOne(() => DrumType) @JoinColumn({ name: 'drum_type_id' }) drumType?: DrumType;
  @Bool('foams') foams: boolean;
  @Bool('shear_sensitive') shearSensitive: boolean;
  @Float('solids_wt_pct') solidsWtPct: number;
  // What the dock checks on arrival (shared/acceptance); null when not registered.
  @Column({ name: 'shelf_life_days', type: 'integer', nullable: true }) shelfLifeDays: number | null;
  @Column({ name: 'min_remaining_days', type: 'integer', nullable: true }) minRemainingDays: number | null;
  @Column({ name: 'storage_min_c', type: 'real', nullable: true }) storageMinC: number | null;
  @Column({ name: 'storage_max_c', type: 'real', nullable: true }) storageMaxC: number | null;
  @Column({ name: 'certificate_required', type: 'boolean', default: false }) certificateRequired: boolean;
  // Its own properties (shared/records/slurry.ts SlurryProperties); null when not registered.
  @NullableFloat('density_kg_m3') densityKgM3: number | null;
  @NullableText('viscosity_model', 12) viscosityModel: ViscosityModel | null;
  @NullableFloat('viscosity_mpa_s') viscosityMPaS: number | null;
  @NullableFloat('consistency_pa_sn') consistencyPaSn: number | null;
  @NullableFloat('flow_index') flowIndex: number | null;
  @NullableFloat('particle_size_nm') particleSizeNm: number | null;
  @NullableFloat('min_velocity_m_s') minVelocityMs: number | null;
  @NullableFloat('max_velocity_m_s') maxVelocityMs: number | null;
  @NullableFloat('max_wall_shear_per_s') maxWallShearPerS: number | null;
  @NullableFloat('min_turnovers') minTurnovers: number | null;
  @NullableFloat('min_recirc_minutes') minRecircMinutes: number | null;
  @NullableFloat('ph_min') phMin: number | null;
  @NullableFloat('ph_max') phMax: number | null;
  @NullableText('oxidiser', 8) oxidiser: Oxidiser | null;
  @NullableFloat('solvent_wt_pct') solventWtPct: number | null;
}

@Entity({ name: 'stations' })
export class Station extends Base {
  @Text('name', 120) name: string;
  @Text('bay', 60) bay: string;
  @Text('tapping', 12) tapping: 'two-opening' | 'one-opening';
  @Text('agitation', 12) agitation: 'pump' | 'mechanical';
  @NullableUuid('connector_id') connectorId: string | null;
  @ManyToOne(() => Connector) @JoinColumn({ name: 'connector_id' }) connector?: Connector | null;
  @Float('flow_lpm') flowLpm: number;
  /** The transfer line from the station to the loop, for its pressure drop (shared/line-loss.ts); null when not registered. */
  @NullableFloat('line_length_m') lineLengthM: number | null;
  @NullableFloat('line_bore_mm') lineBoreMm: number | null;
  @NullableFloat('line_roughness_um') lineRoughnessUm: number | null;
}

@Entity({ name: 'tube_sets' })
export class TubeSet extends Base {
  @Uuid('station_id') stationId: string;
  @ManyToOne(() => Station, { onDelete: 'CASCADE' }) @JoinColumn({ name: 'station_id' }) station?: Station;
  @Text('label', 40) label: string;
  @Uuid('dip_tube_id') dipTubeId: string;
  @ManyToOne(() => DipTube) @JoinColumn({ name: 'dip_tube_id' }) dipTube?: DipTube;
  @Text('state', 10) state: (typeof TUBE_SET_STATES)[number];
  @Column({ name: 'last_rinsed_at', type: 'timestamptz', nullable: true }) lastRinsedAt: Date | null;
  @NullableUuid('last_rinsed_by_id') lastRinsedById: string | null;
  @ManyToOne(() => User) @JoinColumn({ name: 'last_rinsed_by_id' }) lastRinsedBy?: User | null;
  @Column({ name: 'last_used_at', type: 'timestamptz', nullable: true }) lastUsedAt: Date | null;
  /** The lot and drum this set is threaded into while online or standby. */
  @NullableText('current_lot_number', LOT_NUMBER_MAX_LENGTH) currentLotNumber: string | null;
  @NullableText('current_drum_serial', 60) currentDrumSerial: string | null;
  @NullableUuid('current_receiving_check_id') currentReceivingCheckId: string | null;
}
