import { StyleSheet, View } from 'react-native';
import { TEMPERATURE_INDICATOR_LABELS, TEMPERATURE_INDICATORS } from '@/shared/acceptance/types';
import { REGION_LABELS, type SlurryRecord, type SupplierRecord } from '@/shared/contract/records';
import { keptSlurries, keptSuppliers } from './dock-sources';
import { space } from '../theme';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField } from '../ui/number-field';
import { RecordPicker } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { LotNumberField } from './lot-number-field';
import { SectionTitle } from '../ui/section-title';
import type { DockForm } from './use-dock-form';

const INDICATOR_OPTIONS = TEMPERATURE_INDICATORS.map((value) => ({ value, label: TEMPERATURE_INDICATOR_LABELS[value] }));

/** The lot as its label says (typed, or scanned: number and dates): number, drums, slurry and supplier. */
export function DockLotCard({ form }: { form: DockForm }) {
  const { draft, set, errors, lotRef, applyLabel } = form;
  return (
    <Card>
      <SectionTitle>The lot</SectionTitle>
      <LotNumberField ref={lotRef} value={draft.lot} onChangeText={(v) => set('lot', v)} label={draft.label} onLabel={applyLabel} error={errors.lotNumber} testID="dock-lot" />
      <NumberField label="Drums in this lot" value={draft.count} onChangeText={(v) => set('count', v)} inputMode="numeric" suffix="drums" error={errors.drumCount} testID="dock-count" />
      <RecordPicker<SlurryRecord>
        label="Slurry"
        hint="Its shelf life, storage range and certificate are checked; foaming and shear-sensitive slurries against the station."
        source={keptSlurries}
        toOption={(s) => ({ id: s.id, label: s.name, detail: s.supplierName ?? undefined })}
        value={draft.slurry}
        onChange={(picked, rec) => {
          set('slurry', picked);
          // The slurry's supplier and usual drum fill in what is still empty.
          if (rec && !draft.supplier && rec.supplierName) set('supplier', { id: rec.supplierId, label: `${rec.supplierName} (${REGION_LABELS[rec.region]})` });
          if (rec && !draft.drumType && rec.drumTypeName && draft.mode === 'pick') set('drumType', { id: rec.drumTypeId, label: rec.drumTypeName });
        }}
        noneLabel="Not recorded"
        error={errors.slurryId}
        testID="dock-slurry"
      />
      <RecordPicker<SupplierRecord>
        label="Supplier"
        source={keptSuppliers}
        toOption={(s) => ({ id: s.id, label: `${s.name} (${REGION_LABELS[s.region]})` })}
        value={draft.supplier}
        onChange={(p) => set('supplier', p)}
        noneLabel="Not recorded"
        error={errors.supplierId}
        testID="dock-supplier"
      />
    </Card>
  );
}

/** What the lot's condition says: its dates and the temperature indicator on the drums. */
export function DockConditionCard({ form }: { form: DockForm }) {
  const { draft, set, errors } = form;
  const date = (key: 'productionDate' | 'expiryDate') => ({ value: draft[key], onChangeText: (v: string) => set(key, v), inputMode: 'numeric' as const, error: errors[key] });
  return (
    <Card>
      <SectionTitle>Dates and temperature</SectionTitle>
      <View style={styles.dates}>
        <View style={styles.date}>
          <TextField label="Production date" hint="YYYY-MM-DD" placeholder="2026-10-01" {...date('productionDate')} testID="dock-production" />
        </View>
        <View style={styles.date}>
          <TextField label="Expiry date" hint="YYYY-MM-DD, if on the label" placeholder="2027-10-01" {...date('expiryDate')} testID="dock-expiry" />
        </View>
      </View>
      <ChoiceChips label="Temperature indicator" options={INDICATOR_OPTIONS} value={draft.indicator} onChange={(v) => set('indicator', v)} error={errors.indicator} testID="dock-indicator" />
    </Card>
  );
}

const styles = StyleSheet.create({
  dates: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  date: { flexGrow: 1, flexBasis: 150, minWidth: 0 },
});
