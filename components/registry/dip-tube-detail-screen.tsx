import { dipTubeQueries, type DipTubeRecord } from '../data/dip-tubes';
import { useLengthUnit } from '../data/me';
import { useCanEditRegistry } from './use-can-edit-registry';
import { AttachmentsPanel } from '../attachments/attachments-panel';
import { DetailColumns, DetailScreen, FactLink, FactList, RelationList, Section } from './detail-parts';
import { CHANNEL_LABELS } from './labels';
import { StatusChip } from './status-chip';

export function DipTubeDetailScreen({ id }: { id: string }) {
  const canEdit = useCanEditRegistry();
  const query = dipTubeQueries.useDetail(id);
  const { show } = useLengthUnit();
  return (
    <DetailScreen<DipTubeRecord>
      resource="dip-tubes"
      id={id}
      kind="Dip tube"
      query={query}
      title={(t) => t.partNumber}
      subtitle={(t) => `${t.threadCode ?? 'unknown thread'} dip tube · ${show(t.lengthMm)} · ${t.supplierName ?? 'unknown supplier'}`}
      showsLengths
    >
      {(t) => (
        <DetailColumns
          left={
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
            </Section>
          }
          right={
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
              <Section title="Pairings" testID="tube-pairings">
                <RelationList
                  empty="This tube is not paired with a dispense head yet."
                  items={(t.pairings ?? []).map((p) => ({
                    key: p.id,
                    title: `With ${p.connectorPartNumber ?? 'a dispense head'}`,
                    href: `/registry/pairings/${p.id}`,
                    aside: <StatusChip status={p.status} />,
                    links: [{ label: 'Dispense head', href: `/registry/connectors/${p.connectorId}` }],
                    testID: `tube-pairing-${p.connectorPartNumber}`,
                  }))}
                />
              </Section>
              <AttachmentsPanel ownerKind="dip-tube" ownerId={id} canAdd={canEdit} title="Spec sheets and photos" />
            </>
          }
        />
      )}
    </DetailScreen>
  );
}
