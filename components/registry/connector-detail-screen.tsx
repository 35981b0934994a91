import { connectorQueries, type ConnectorRecord } from '../data/connectors';
import { useLengthUnit } from '../data/me';
import { useCanEditRegistry } from './use-can-edit-registry';
import { AttachmentsPanel } from '../attachments/attachments-panel';
import { DetailColumns, DetailScreen, FactLink, FactList, RelationList, Section } from './detail-parts';
import { RETURN_PATH_LABELS, SUITED_TO_LABELS, TAPPING_LABELS } from './labels';
import { StatusChip } from './status-chip';

export function ConnectorDetailScreen({ id }: { id: string }) {
  const canEdit = useCanEditRegistry();
  const query = connectorQueries.useDetail(id);
  const { show } = useLengthUnit();
  return (
    <DetailScreen<ConnectorRecord>
      resource="connectors"
      id={id}
      kind="Dispense head"
      query={query}
      title={(c) => c.partNumber}
      subtitle={(c) => `Dispense head · ${SUITED_TO_LABELS[c.suitedTo].toLowerCase()} · ${c.supplierName ?? 'unknown supplier'}`}
      showsLengths
    >
      {(c) => {
        const flowHref = `/tools/flow?feed=${c.feedBoreMm}${c.returnBoreMm != null ? `&return=${c.returnBoreMm}` : ''}`;
        return (
          <DetailColumns
            left={
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
              </Section>
            }
            right={
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
                <Section title="Pairings" testID="connector-pairings">
                  <RelationList
                    empty="This head is not paired with a dip tube yet."
                    items={(c.pairings ?? []).map((p) => ({
                      key: p.id,
                      title: `With ${p.dipTubePartNumber ?? 'a dip tube'}`,
                      href: `/registry/pairings/${p.id}`,
                      aside: <StatusChip status={p.status} />,
                      links: [{ label: 'Dip tube', href: `/registry/dip-tubes/${p.dipTubeId}` }],
                      testID: `connector-pairing-${p.dipTubePartNumber}`,
                    }))}
                  />
                </Section>
                <AttachmentsPanel ownerKind="connector" ownerId={id} canAdd={canEdit} title="Spec sheets and photos" />
              </>
            }
          />
        );
      }}
    </DetailScreen>
  );
}
