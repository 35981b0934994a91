import { registryDetail, FactLink, FactList, PartPairings, RelationList, Section, SpecSheets } from './detail-parts';
import { CHANNEL_LABELS } from './labels';

export const DipTubeDetailScreen = registryDetail('dip-tubes', {
  title: (t) => t.partNumber,
  subtitle: (t, { show }) => `${t.threadCode ?? 'unknown thread'} dip tube · ${show(t.lengthMm)} · ${t.supplierName ?? 'unknown supplier'}`,
  columns: (t, { id, show }) => [
    <Section title="Tube" testID="tube-facts">
      <FactList
        facts={[
          { label: 'Part number', value: t.partNumber },
          { label: 'Supplier', value: t.supplierName ? <FactLink href={`/registry/suppliers/${t.supplierId}`} label={t.supplierName} /> : '—' },
          { label: 'Thread', value: t.threadCode ? <FactLink href={`/registry/drum-types?thread=${encodeURIComponent(t.threadCode)}`} label={t.threadCode} /> : 'not recorded' },
          { label: 'Length (seat to tip)', value: show(t.lengthMm), testID: 'tube-length' },
          { label: 'Bore', value: show(t.boreMm) },
          { label: 'Outside diameter', value: show(t.odMm) },
          { label: 'Material', value: t.material },
          { label: 'Key code', value: t.keyCode ?? 'unkeyed' },
          { label: 'Channels', value: CHANNEL_LABELS[t.channels] },
        ]}
      />
    </Section>,
    <>
      <Section
        title="Drum types it threads into"
        note={`Drum types with a bung threaded ${t.threadCode ?? 'the same'}. Whether the tube reaches the bottom without touching it is judged per drum by the dock check.`}
        testID="tube-fits"
      >
        <RelationList
          empty="No registered drum type has a bung with this thread."
          items={(t.fitsDrumTypes ?? []).map((d) => ({
            key: d.id,
            title: d.name,
            href: `/registry/drum-types/${d.id}`,
            detail: `${d.partNumber} · inside depth ${show(d.insideDepthMm)}`,
            testID: `tube-fits-${d.partNumber}`,
          }))}
        />
      </Section>
      <PartPairings pairings={t.pairings} pairedWith="connector" empty="This tube is not paired with a dispense head yet." page="tube" />
      <SpecSheets ownerKind="dip-tube" ownerId={id} />
    </>,
  ],
});
