import { registryDetail, FactLink, FactList, RelationList, Section, SpecSheets } from './detail-parts';
import { DrumTypeChecks } from './drum-type-checks';
import { HEAD_LABELS, MATERIAL_LABELS, POSITION_LABELS, regionLabel } from './labels';
import { StatusChip } from './status-chip';

export const DrumTypeDetailScreen = registryDetail('drum-types', {
  title: (d) => d.name,
  subtitle: (d) => `${d.partNumber} · ${d.supplierName ?? 'unknown supplier'} · ${regionLabel(d.region)}`,
  columns: (d, { id, show }) => [
    <>
      <Section title="Drum" testID="drum-facts">
        <FactList
          facts={[
            { label: 'Part number', value: d.partNumber },
            { label: 'Supplier', value: d.supplierName ? <FactLink href={`/registry/suppliers/${d.supplierId}`} label={d.supplierName} /> : '—' },
            { label: 'Region', value: regionLabel(d.region) },
            { label: 'Nominal capacity', value: `${d.nominalCapacityL} L` },
            { label: 'Material', value: MATERIAL_LABELS[d.material] },
            { label: 'Head', value: HEAD_LABELS[d.head] },
            {
              label: 'UN packaging code',
              value: d.unPackagingCode ? <FactLink href={`/tools/packaging-code?code=${encodeURIComponent(d.unPackagingCode)}`} label={d.unPackagingCode} /> : 'not recorded',
            },
            { label: 'Outside height', value: show(d.outsideHeightMm) },
            { label: 'Inside depth (seat to bottom)', value: show(d.insideDepthMm), testID: 'drum-inside-depth' },
            { label: 'Outside diameter', value: show(d.outsideDiameterMm) },
          ]}
        />
      </Section>
      <Section title="Openings" note="Each bung's thread decides which dip tubes can go in; the collar key, which heads lock on." testID="drum-openings">
        <RelationList
          empty="No openings are recorded."
          items={d.openings.map((o) => ({
            key: o.id ?? o.label,
            title: `${o.label} — ${o.threadCode ?? 'unknown thread'}`,
            detail: `${POSITION_LABELS[o.position]} · bore ${show(o.boreMm)} · ${o.keyCode ? `key collar ${o.keyCode}` : 'no key collar'}`,
            links: o.threadCode ? [{ label: `Dip tubes with ${o.threadCode}`, href: `/registry/dip-tubes?thread=${encodeURIComponent(o.threadCode)}` }] : [],
            testID: `drum-opening-${o.label}`,
          }))}
        />
      </Section>
    </>,
    <>
      <DrumTypeChecks id={id} unPackagingCode={d.unPackagingCode} outsideDiameterMm={d.outsideDiameterMm} insideDepthMm={d.insideDepthMm} />
      <Section
        title="Pairings for its threads"
        note="Tube and dispense head pairings whose tube threads into one of these bungs; the dock check decides whether they reach and lock."
        testID="drum-pairings"
      >
        <RelationList
          empty="No pairing has a tube with one of these threads yet."
          items={(d.pairings ?? []).map((p) => ({
            key: p.id,
            title: `${p.dipTubePartNumber ?? 'tube'} + ${p.connectorPartNumber ?? 'connector'}`,
            href: `/registry/pairings/${p.id}`,
            detail: p.threadCode ? `Thread ${p.threadCode}` : undefined,
            aside: <StatusChip status={p.status} />,
            links: [
              { label: 'Dip tube', href: `/registry/dip-tubes/${p.dipTubeId}` },
              { label: 'Dispense head', href: `/registry/connectors/${p.connectorId}` },
            ],
            testID: `drum-pairing-${p.dipTubePartNumber}+${p.connectorPartNumber}`,
          }))}
        />
      </Section>
      <Section title="Slurries arriving in it" testID="drum-slurries">
        <RelationList
          empty="No slurry on contract arrives in this drum type."
          items={(d.slurries ?? []).map((s) => ({ key: s.id, title: s.name, href: `/registry/slurries/${s.id}`, testID: `drum-slurry-${s.name}` }))}
        />
      </Section>
      <SpecSheets ownerKind="drum-type" ownerId={id} />
    </>,
  ],
});
