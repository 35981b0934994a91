// The choices the registry API accepts (server/registry/registry.dto.ts), with the words shown for them.
import { REGION_LABELS, type Region } from '@/shared/contract/records';

type Options<T extends string> = ReadonlyArray<{ value: T; label: string }>;

export const REGION_OPTIONS: Options<Region> = (Object.keys(REGION_LABELS) as Region[]).map((value) => ({ value, label: REGION_LABELS[value] }));

export const MATERIAL_OPTIONS: Options<'steel' | 'plastic' | 'fibre' | 'aluminium' | 'other'> = [
  { value: 'steel', label: 'Steel' },
  { value: 'plastic', label: 'Plastic' },
  { value: 'fibre', label: 'Fibre' },
  { value: 'aluminium', label: 'Aluminium' },
  { value: 'other', label: 'Other' },
];

export const HEAD_OPTIONS: Options<'tight' | 'open'> = [
  { value: 'tight', label: 'Tight head (bungs)' },
  { value: 'open', label: 'Open head (lid)' },
];

export const POSITION_OPTIONS: Options<'large' | 'small' | 'center' | 'other'> = [
  { value: 'large', label: 'Large bung' },
  { value: 'small', label: 'Small bung' },
  { value: 'center', label: 'Centre' },
  { value: 'other', label: 'Other' },
];

export const CHANNEL_OPTIONS: Options<'feed' | 'feed-return'> = [
  { value: 'feed', label: 'Feed only' },
  { value: 'feed-return', label: 'Feed and return' },
];

export const RETURN_PATH_OPTIONS: Options<'none' | 'restricted' | 'open'> = [
  { value: 'none', label: 'No return' },
  { value: 'restricted', label: 'Restricted return' },
  { value: 'open', label: 'Open return' },
];

export const SUITED_OPTIONS: Options<'two-opening' | 'one-opening' | 'both'> = [
  { value: 'two-opening', label: 'Two-opening tapping' },
  { value: 'one-opening', label: 'One-opening tapping' },
  { value: 'both', label: 'Both' },
];

export const TAPPING_OPTIONS: Options<'two-opening' | 'one-opening'> = [
  { value: 'two-opening', label: 'Two openings' },
  { value: 'one-opening', label: 'One opening' },
];

export const AGITATION_OPTIONS: Options<'pump' | 'mechanical'> = [
  { value: 'pump', label: 'Pump recirculation' },
  { value: 'mechanical', label: 'Mechanical stirrer' },
];

export const YES_NO_OPTIONS: Options<'yes' | 'no'> = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
];

/** The label of a value in an option list, or the value itself. */
export function optionLabel<T extends string>(options: Options<T>, value: T | null | undefined): string {
  return options.find((o) => o.value === value)?.label ?? value ?? 'none';
}
