import { registryDetail, FactLink, FactList, PartPairings, RelationList, Section, SpecSheets } from './detail-parts';
import { RETURN_PATH_LABELS, SUITED_TO_LABELS, TAPPING_LABELS } from './labels';

export const ConnectorDetailScreen = registryDetail('connectors', {
  title: (c) => c.partNumber,
  subtitle: (c) => `Dispense head · ${SUITED_TO_LABELS[c.suitedTo].toLowerCase()} · ${c.supplierName ?? 'unknown supplier'}`,
  columns: (c, { id, show }) => {
    const flowHref = `/tools/flow?feed=${c.feedBoreMm}${c.returnBoreMm != null ? `&return=${c.returnBoreMm}` : ''}`;
    return [
      <Section title="Head" testID="connector-facts">
        <FactList
          facts={[
            { label: 'Part number', value: c.partNumber },
            { label: 'Supplier', value: c.supplierName ? <FactLink href={`/registry/suppliers/${c.supplierId}`} label={c.supplierName} /> : '—' },
            { label: 'Key code', value: c.keyCode ?? 'unkeyed' },
            { label: 'Feed port', value: `${c.feedNominal} (bore ${show(c.feedBoreMm, 2)})`, testID: 'connector-feed' },
            { label: 'Return port', value: c.returnBoreMm == null ? 'none' : `${c.returnNominal ?? ''} (bore ${show(c.returnBoreMm, 2)})`.trim() },
            { label: 'Return path', value: RETURN_PATH_LABELS[c.returnPath] },
            { label: 'Suited to', value: SUITED_TO_LABELS[c.suitedTo] },
            { label: 'Wetted materials', value: c.wettedMaterials },
            { label: 'Flow through its ports', value: <FactLink href={flowHref} label="Open in the flow calculator" testID="connector-flow-link" /> },
          ]}
        />
      </Section>,
      <>
        <Section title="Stations using it" testID="connector-stations">
          <RelationList
            empty="No station has this head installed."
            items={(c.stations ?? []).map((s) => ({
              key: s.id,
              title: s.name,
              href: `/stations/${s.id}`,
              detail: `${s.bay} · ${TAPPING_LABELS[s.tapping] ?? s.tapping}`,
              testID: `connector-station-${s.name}`,
            }))}
          />
        </Section>
        <PartPairings pairings={c.pairings} pairedWith="dip-tube" empty="This head is not paired with a dip tube yet." page="connector" />
        <SpecSheets ownerKind="connector" ownerId={id} />
      </>,
    ];
  },
});
