import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { REGION_LABELS, type Region } from '@/shared/contract/records';
import { keyCodeQueries } from '../data/key-codes';
import { supplierQueries } from '../data/suppliers';
import { threadSpecQueries } from '../data/thread-specs';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { ChoiceChips } from '../ui/choice-chips';
import { STATUS_LABELS, SUITED_TO_LABELS } from './labels';
import type { FilterName, ListState } from './use-list-state';

/** The filters a list offers; 'suitedTo' is the connectors' use of the API's `status` parameter. */
export type FilterKind = 'region' | 'thread' | 'key' | 'pairingStatus' | 'suitedTo';

interface FilterSpec {
  kind: FilterKind;
  param: FilterName;
  label: string;
  options: { value: string; label: string }[];
}

const ANY = 'any';
const REFERENCE_LIST = { pageSize: 200 } as const;

/** The choices of each filter; thread and key codes come from the registry's own reference lists. */
function useFilterSpecs(kinds: readonly FilterKind[]): FilterSpec[] {
  const threads = threadSpecQueries.useList({ ...REFERENCE_LIST, sort: 'code' }, { enabled: kinds.includes('thread') });
  const keys = keyCodeQueries.useList({ ...REFERENCE_LIST, sort: 'code' }, { enabled: kinds.includes('key') });
  return kinds.map((kind): FilterSpec => {
    switch (kind) {
      case 'region':
        return { kind, param: 'region', label: 'Region', options: (Object.keys(REGION_LABELS) as Region[]).map((r) => ({ value: r, label: REGION_LABELS[r] })) };
      case 'thread':
        return { kind, param: 'thread', label: 'Thread', options: (threads.data?.items ?? []).map((t) => ({ value: t.code, label: t.code })) };
      case 'key':
        return { kind, param: 'key', label: 'Key code', options: (keys.data?.items ?? []).map((k) => ({ value: k.code, label: k.code })) };
      case 'pairingStatus':
        return { kind, param: 'status', label: 'Status', options: (['approved', 'draft', 'retired'] as const).map((s) => ({ value: s, label: STATUS_LABELS[s] })) };
      case 'suitedTo':
        return { kind, param: 'status', label: 'Suited to', options: (Object.keys(SUITED_TO_LABELS) as Array<keyof typeof SUITED_TO_LABELS>).map((s) => ({ value: s, label: SUITED_TO_LABELS[s] })) };
    }
  });
}

/**
 * One compact button per filter, showing its current choice; pressing it opens that filter's choices
 * below the row (one at a time), so the row stays short on a phone.
 */
export function FilterBar({ kinds, state }: { kinds: readonly FilterKind[]; state: ListState }) {
  const specs = useFilterSpecs(kinds);
  const [open, setOpen] = useState<FilterKind | null>(null);
  const openSpec = specs.find((s) => s.kind === open);
  const anySet = Object.values(state.filters).some(Boolean);
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        {specs.map((spec) => {
          const value = state.filters[spec.param];
          const current = value ? (spec.options.find((o) => o.value === value)?.label ?? value) : 'Any';
          const expanded = open === spec.kind;
          return (
            <Pressable
              key={spec.kind}
              role="button"
              aria-expanded={expanded}
              aria-label={`${spec.label}: ${current}. Change`}
              testID={`filter-${spec.kind}`}
              onPress={() => setOpen(expanded ? null : spec.kind)}
              style={(s: { pressed: boolean; focused?: boolean }) => [styles.button, (value || expanded) && styles.buttonOn, s.focused && styles.focusRing]}
            >
              <Text style={styles.buttonText} numberOfLines={1}>
                {spec.label}: <Text style={styles.buttonValue}>{current}</Text>
              </Text>
              <Text style={styles.caret} aria-hidden>
                {expanded ? '▴' : '▾'}
              </Text>
            </Pressable>
          );
        })}
        {state.filters.supplierId ? <SupplierFilterChip id={state.filters.supplierId} onClear={() => state.setFilter('supplierId', undefined)} /> : null}
        {anySet ? <Button label="Clear filters" variant="quiet" onPress={state.clearFilters} testID="filter-clear" /> : null}
      </View>
      {openSpec ? (
        <View style={styles.panel} testID={`filter-${openSpec.kind}-panel`}>
          {openSpec.options.length === 0 ? (
            <Text style={type.body}>Loading the {openSpec.label.toLowerCase()} choices…</Text>
          ) : (
            <ChoiceChips
              label={openSpec.label}
              options={[{ value: ANY, label: 'Any' }, ...openSpec.options]}
              value={state.filters[openSpec.param] ?? ANY}
              onChange={(v) => {
                state.setFilter(openSpec.param, v === ANY ? undefined : v);
                setOpen(null);
              }}
              testID={`filter-${openSpec.kind}-option`}
            />
          )}
        </View>
      ) : null}
    </View>
  );
}

/** A list opened from a supplier's page is narrowed to that supplier; the chip says so and undoes it. */
function SupplierFilterChip({ id, onClear }: { id: string; onClear: () => void }) {
  const supplier = supplierQueries.useDetail(id);
  const name = supplier.data?.name ?? 'one supplier';
  return (
    <Pressable
      role="button"
      aria-label={`Supplier: ${name}. Remove this filter`}
      testID="filter-supplier-clear"
      onPress={onClear}
      style={(s: { pressed: boolean; focused?: boolean }) => [styles.button, styles.buttonOn, s.focused && styles.focusRing]}
    >
      <Text style={styles.buttonText} numberOfLines={1}>
        Supplier: <Text style={styles.buttonValue}>{name}</Text>
      </Text>
      <Text style={styles.caret} aria-hidden>
        ✕
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  button: {
    minHeight: minTouch,
    maxWidth: '100%',
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 1.5,
    borderColor: colors.inkMuted,
    backgroundColor: colors.surface,
  },
  buttonOn: { borderColor: colors.primary, borderWidth: 2, backgroundColor: colors.surfaceSunk },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  buttonText: { fontFamily: fonts.regular, fontSize: 15, color: colors.ink, flexShrink: 1 },
  buttonValue: { fontFamily: fonts.semibold, color: colors.primary },
  caret: { fontFamily: fonts.semibold, fontSize: 14, color: colors.ink },
  panel: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, padding: space.md },
});
