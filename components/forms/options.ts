// The choices the registry API accepts (server/registry/registry.dto.ts), with the words shown for them.
import { REGION_LABELS, type ConnectorRecord, type DipTubeRecord, type DrumTypeRecord, type OpeningRecord, type Region, type StationRecord } from '@/shared/contract/records';

type Options<T extends string> = ReadonlyArray<{ value: T; label: string }>;

/** A choice list from each value's words, in their order. */
function choices<T extends string>(labels: Record<T, string>): Options<T> {
  return (Object.keys(labels) as T[]).map((value) => ({ value, label: labels[value] }));
}

export const REGION_OPTIONS = choices<Region>(REGION_LABELS);

export const MATERIAL_OPTIONS = choices<DrumTypeRecord['material']>({ steel: 'Steel', plastic: 'Plastic', fibre: 'Fibre', aluminium: 'Aluminium', other: 'Other' });

export const HEAD_OPTIONS = choices<DrumTypeRecord['head']>({ tight: 'Tight head (bungs)', open: 'Open head (lid)' });

export const POSITION_OPTIONS = choices<OpeningRecord['position']>({ large: 'Large bung', small: 'Small bung', center: 'Centre', other: 'Other' });

export const CHANNEL_OPTIONS = choices<DipTubeRecord['channels']>({ feed: 'Feed only', 'feed-return': 'Feed and return' });

export const RETURN_PATH_OPTIONS = choices<ConnectorRecord['returnPath']>({ none: 'No return', restricted: 'Restricted return', open: 'Open return' });

export const SUITED_OPTIONS = choices<ConnectorRecord['suitedTo']>({ 'two-opening': 'Two-opening tapping', 'one-opening': 'One-opening tapping', both: 'Both' });

export const TAPPING_OPTIONS = choices<StationRecord['tapping']>({ 'two-opening': 'Two openings', 'one-opening': 'One opening' });

export const AGITATION_OPTIONS = choices<StationRecord['agitation']>({ pump: 'Pump recirculation', mechanical: 'Mechanical stirrer' });

export const YES_NO_OPTIONS = choices<'yes' | 'no'>({ yes: 'Yes', no: 'No' });

/** The label of a value in an option list, or the value itself. */
export function optionLabel<T extends string>(options: Options<T>, value: T | null | undefined): string {
  return options.find((o) => o.value === value)?.label ?? value ?? 'none';
}
