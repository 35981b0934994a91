import { router } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import type { Region } from '@/shared/contract/records';
import { checkDrumPackagingCode } from '@/shared/packaging-code';
import { DRUM_TYPE_LABELS, DRUM_TYPE_LIMITS as L, DRUM_TYPE_SAYS, drumTypeLabelOf, drumTypeProblem } from '@/shared/records/drum-type';
import { sentence } from '@/shared/records/field';
import { drumTypeQueries, type DrumTypeRecord } from '../data/drum-types';
import { colors, type } from '../theme';
import { ChoiceChips } from '../ui/choice-chips';
import { lengthDraft, LengthField, NumberField, numberText, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import { Checks, mmOf, trimOrNull } from './checks';
import { bindSupplier, fieldBinders } from './bind';
import { FieldRow, FormFrame, FormSection } from './form-frame';
import { HEAD_OPTIONS, MATERIAL_OPTIONS, optionLabel, REGION_OPTIONS } from './options';
import { emptyOpening, newKey, OpeningsEditor, type OpeningDraft } from './drum-openings-editor';
import { SupplierPicker } from './pickers';
import { useRecordForm, type FormSpec } from './use-record-form';

export type DrumTypeDraft = {
  partNumber: string;
  name: string;
  supplierId: PickedRef | null;
  region: Region | null;
  nominalCapacityL: string;
  material: DrumTypeRecord['material'] | null;
  head: DrumTypeRecord['head'] | null;
  unPackagingCode: string;
  outsideHeightMm: LengthDraft;
  insideDepthMm: LengthDraft;
  outsideDiameterMm: LengthDraft;
  openings: OpeningDraft[];
};

const code = (c: string | null): PickedRef | null => (c ? { id: c, label: c } : null);

/** The packaging-code findings for the draft: a failure to read the code blocks saving, a mismatch is a warning. */
function packagingFindings(d: DrumTypeDraft) {
  if (!d.unPackagingCode.trim() || !d.material || !d.head) return [];
  return checkDrumPackagingCode({ code: d.unPackagingCode, material: d.material, head: d.head });
}

export const drumTypeSpec: FormSpec<DrumTypeRecord, DrumTypeDraft> = {
  noun: 'drum type',
  empty: (unit) => ({
    partNumber: '',
    name: '',
    supplierId: null,
    region: null,
    nominalCapacityL: '',
    material: null,
    head: null,
    unPackagingCode: '',
    outsideHeightMm: lengthDraft(null, unit),
    insideDepthMm: lengthDraft(null, unit),
    outsideDiameterMm: lengthDraft(null, unit),
    openings: [emptyOpening(unit)],
  }),
  fromRecord: (d, unit) => ({
    partNumber: d.partNumber,
    name: d.name,
    supplierId: { id: d.supplierId, label: d.supplierName ?? 'Supplier' },
    region: d.region,
    nominalCapacityL: numberText(d.nominalCapacityL, 2),
    material: d.material,
    head: d.head,
    unPackagingCode: d.unPackagingCode ?? '',
    outsideHeightMm: lengthDraft(d.outsideHeightMm, unit),
    insideDepthMm: lengthDraft(d.insideDepthMm, unit),
    outsideDiameterMm: lengthDraft(d.outsideDiameterMm, unit),
    openings: d.openings.map((o) => ({ _key: o.id ?? newKey(), label: o.label, threadCode: code(o.threadCode), boreMm: lengthDraft(o.boreMm, unit), keyCode: code(o.keyCode), position: o.position })),
  }),
  check: (d) => {
    const c = new Checks();
    c.text('partNumber', 'Part number', d.partNumber, { max: L.partNumberChars });
    c.text('name', 'Name', d.name, { max: L.nameChars });
    c.pick('supplierId', 'Supplier', d.supplierId, 'the drum maker or slurry supplier');
    c.choice('region', 'Region', d.region);
    c.number('nominalCapacityL', 'Nominal capacity', d.nominalCapacityL, { min: 0, above: true, max: L.nominalCapacityMaxL, unit: 'L' });
    c.choice('material', 'Material', d.material);
    c.choice('head', 'Head', d.head);
    c.text('unPackagingCode', 'UN packaging code', d.unPackagingCode, { max: L.unPackagingCodeChars, optional: true });
    const codeProblem = packagingFindings(d).find((f) => f.outcome === 'fail' && (f.check === 'code' || f.check === 'kind'));
    if (codeProblem) c.rule('unPackagingCode', false, codeProblem.message);
    const height = c.length('outsideHeightMm', 'Outside height', d.outsideHeightMm, { maxMm: L.outsideHeightMaxMm });
    const depth = c.length('insideDepthMm', 'Inside depth', d.insideDepthMm, { maxMm: L.insideDepthMaxMm });
    const across = drumTypeProblem({ insideDepthMm: depth, outsideHeightMm: height });
    if (across) c.rule(across.field, false, sentence(DRUM_TYPE_LABELS[across.field], across.says));
    c.length('outsideDiameterMm', 'Outside diameter', d.outsideDiameterMm, { maxMm: L.outsideDiameterMaxMm });
    c.rule('openings', d.openings.length >= L.openingsMin, 'A drum type needs at least one opening.');
    c.rule('openings', d.openings.length <= L.openingsMax, `A drum type has at most ${L.openingsMax} openings.`);
    const seen = new Set<string>();
    d.openings.forEach((o, i) => {
      const n = `Opening ${i + 1}`;
      c.text(`openings.${i}.label`, `${n} label`, o.label, { max: L.openingLabelChars });
      const label = o.label.trim();
      if (label) c.rule(`openings.${i}.label`, !seen.has(label), `${n} label ${DRUM_TYPE_SAYS.openingLabel} ("${label}" is used twice).`);
      seen.add(label);
      c.pick(`openings.${i}.threadCode`, `${n} thread`, o.threadCode, 'its thread');
      c.length(`openings.${i}.boreMm`, `${n} bore`, o.boreMm, { maxMm: L.openingBoreMaxMm });
      c.choice(`openings.${i}.position`, `${n} position`, o.position);
    });
    return c.errors;
  },
  toBody: (d) => ({
    partNumber: d.partNumber.trim(),
    name: d.name.trim(),
    supplierId: d.supplierId!.id,
    region: d.region,
    nominalCapacityL: Number(d.nominalCapacityL.trim().replace(',', '.')),
    material: d.material,
    head: d.head,
    unPackagingCode: trimOrNull(d.unPackagingCode),
    outsideHeightMm: mmOf(d.outsideHeightMm),
    insideDepthMm: mmOf(d.insideDepthMm),
    outsideDiameterMm: mmOf(d.outsideDiameterMm),
    openings: d.openings.map((o) => ({ label: o.label.trim(), threadCode: o.threadCode!.id, boreMm: mmOf(o.boreMm), keyCode: o.keyCode?.id ?? null, position: o.position })),
  }),
  labelOf: drumTypeLabelOf,
  describe: (key, d) => {
    if (key === 'openings') return d.openings.map((o) => `${o.label || 'unnamed'} (${o.threadCode?.label ?? 'no thread'}${o.keyCode ? `, key ${o.keyCode.label}` : ''})`).join('; ');
    if (key === 'material') return optionLabel(MATERIAL_OPTIONS, d.material);
    if (key === 'head') return optionLabel(HEAD_OPTIONS, d.head);
    if (key === 'region') return optionLabel(REGION_OPTIONS, d.region);
    return undefined;
  },
};

/** Create (no id) or edit a drum type with its openings. */
export function DrumTypeFormScreen({ id }: { id?: string }) {
  const form = useRecordForm({ spec: drumTypeSpec, source: drumTypeQueries, id, onSaved: (d) => router.replace(`/registry/drum-types/${d.id}` as never) });
  const { draft, field } = form;
  const bind = fieldBinders(form, drumTypeSpec.labelOf);
  const warnings = packagingFindings(draft).filter((f) => f.outcome !== 'pass' && f.check !== 'code' && f.check !== 'kind');
  const explained = packagingFindings(draft).find((f) => f.check === 'code' && f.outcome === 'pass');
  return (
    <FormFrame
      form={form}
      resource="drum-types"
      id={id}
      name={form.base?.partNumber}
      subtitle="The drum as it arrives: its size, its UN mark and every opening. Lengths are saved in mm."
      testID="drum-type-form"
    >
      <FormSection title="Drum">
        <TextField {...bind.code('partNumber')} />
        <TextField {...bind.text('name')} hint="What people call it, e.g. 55 gal lined steel tight head." />
        <SupplierPicker {...bindSupplier(form)} />
        <ChoiceChips {...bind.choice('region')} options={REGION_OPTIONS} />
      </FormSection>
      <FormSection title="Build and marking">
        <ChoiceChips {...bind.choice('material')} options={MATERIAL_OPTIONS} />
        <ChoiceChips {...bind.choice('head')} options={HEAD_OPTIONS} />
        <TextField {...bind.code('unPackagingCode')} hint="Optional: the code from the UN mark, e.g. 1A1 or 1H1." />
        {explained && !field('unPackagingCode').error ? <Text style={type.small}>{explained.message}</Text> : null}
        {warnings.map((w) => (
          <Text key={w.check} role="status" style={styles.warning} testID={`form-unPackagingCode-${w.check}`}>
            ! {w.message}
          </Text>
        ))}
        <NumberField {...bind.text('nominalCapacityL')} suffix="L" />
      </FormSection>
      <FormSection title="Size" full>
        <FieldRow>
          <LengthField {...bind.value('outsideHeightMm')} hint="Overall, bottom chime to top chime." />
          <LengthField {...bind.value('insideDepthMm')} hint="Bung seat to inside bottom." />
          <LengthField {...bind.value('outsideDiameterMm')} hint="Across the rolling hoops." />
        </FieldRow>
      </FormSection>
      <FormSection title="Openings" full testID="form-openings">
        <OpeningsEditor form={form} />
      </FormSection>
    </FormFrame>
  );
}

const styles = StyleSheet.create({
  warning: { ...type.body, color: colors.caution },
});
