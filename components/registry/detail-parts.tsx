import type { UseQueryResult } from '@tanstack/react-query';
import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { PairingStatus } from '@/shared/contract/records';
import { AttachmentsPanel } from '../attachments/attachments-panel';
import type { AttachmentOwnerKind } from '../data/attachments';
import { useLengthUnit } from '../data/me';
import { Screen, type ScreenColumns } from '../screen';
import { colors, fonts, minTouch, space, type } from '../theme';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { LinkButton } from '../ui/link-button';
import { queriesOf, REGISTRY_RESOURCES, type RecordOf, type RegistryResource } from './resources';
import { StatusChip } from './status-chip';
import { UnitToggle } from './unit-toggle';
import { useCanEditRegistry } from './use-can-edit-registry';

/** What a detail page's columns are built with, besides the record. */
export interface DetailContext {
  id: string;
  /** A length in the person's unit (mm or in). */
  show: ReturnType<typeof useLengthUnit>['show'];
}

/** One registry detail page's configuration: `registryDetail` makes its screen. */
interface DetailConfig<T> {
  title: (record: T) => string;
  subtitle?: (record: T, context: DetailContext) => string;
  /** The record's facts, and what is related to it beside them on a wide screen (after them on a phone). */
  columns: (record: T, context: DetailContext) => ScreenColumns;
}

/** A registry detail screen (given the record's id) from its configuration. */
export function registryDetail<R extends RegistryResource>(resource: R, config: DetailConfig<RecordOf<R>>) {
  const { noun, showsLengths } = REGISTRY_RESOURCES[resource];
  const kind = noun.one[0].toUpperCase() + noun.one.slice(1);
  const { useDetail } = queriesOf(resource);
  return function ConfiguredDetail({ id }: { id: string }) {
    return <DetailScreen<RecordOf<R>> {...config} resource={resource} kind={kind} showsLengths={showsLengths} query={useDetail(id)} id={id} />;
  };
}

interface DetailScreenProps<T> extends DetailConfig<T> {
  resource: RegistryResource;
  id: string;
  /** "Drum type": the page title until the record arrives. */
  kind: string;
  query: UseQueryResult<T>;
  showsLengths: boolean;
}

/** The frame of every registry detail page: its states, the mm / in switch and the Edit link for engineers. */
function DetailScreen<T>({ resource, id, kind, query, title, subtitle, showsLengths, columns }: DetailScreenProps<T>) {
  const canEdit = useCanEditRegistry();
  const { show } = useLengthUnit();
  const actions = (
    <>
      {showsLengths ? <UnitToggle /> : null}
      {canEdit && query.data ? <LinkButton href={`/registry/${resource}/edit/${id}`} label="Edit" variant="secondary" testID="registry-edit" /> : null}
    </>
  );
  if (query.isPending) {
    return (
      <Screen title={kind} testID={`registry-detail-${resource}`}>
        <LoadingState label={`Loading the ${kind.toLowerCase()}…`} />
      </Screen>
    );
  }
  if (query.isError) {
    return (
      <Screen title={kind} testID={`registry-detail-${resource}`}>
        <ErrorState error={query.error} onRetry={() => query.refetch()} />
      </Screen>
    );
  }
  return <Screen title={title(query.data)} subtitle={subtitle?.(query.data, { id, show })} actions={actions} testID={`registry-detail-${resource}`} columns={columns(query.data, { id, show })} />;
}

/** A record's spec sheets and photos; engineers add to them. */
export function SpecSheets({ ownerKind, ownerId }: { ownerKind: AttachmentOwnerKind; ownerId: string }) {
  const canEdit = useCanEditRegistry();
  return <AttachmentsPanel ownerKind={ownerKind} ownerId={ownerId} canAdd={canEdit} title="Spec sheets and photos" />;
}

type PartPairing = { id: string; status: PairingStatus; dipTubeId?: string; dipTubePartNumber?: string; connectorId?: string; connectorPartNumber?: string };

const PAIRED_WITH = {
  'dip-tube': { what: 'a dip tube', label: 'Dip tube', path: 'dip-tubes', part: (p: PartPairing) => p.dipTubePartNumber, partId: (p: PartPairing) => p.dipTubeId },
  connector: { what: 'a dispense head', label: 'Dispense head', path: 'connectors', part: (p: PartPairing) => p.connectorPartNumber, partId: (p: PartPairing) => p.connectorId },
} as const;

/** A dip tube's or a dispense head's pairings, each with its status and a link to the other part. */
/** `page` names the test ids: `tube-pairings`, and a row `tube-pairing-<part number>`. */
export function PartPairings({ pairings, pairedWith, empty, page }: { pairings: PartPairing[] | undefined; pairedWith: keyof typeof PAIRED_WITH; empty: string; page: string }) {
  const other = PAIRED_WITH[pairedWith];
  return (
    <Section title="Pairings" testID={`${page}-pairings`}>
      <RelationList
        empty={empty}
        items={(pairings ?? []).map((p) => ({
          key: p.id,
          title: `With ${other.part(p) ?? other.what}`,
          href: `/registry/pairings/${p.id}`,
          aside: <StatusChip status={p.status} />,
          links: [{ label: other.label, href: `/registry/${other.path}/${other.partId(p)}` }],
          testID: `${page}-pairing-${other.part(p)}`,
        }))}
      />
    </Section>
  );
}

export function Section({ title, note, children, testID }: { title: string; note?: string; children: ReactNode; testID?: string }) {
  return (
    <Card testID={testID}>
      <Text role="heading" aria-level={2} style={type.heading}>
        {title}
      </Text>
      {note ? <Text style={type.small}>{note}</Text> : null}
      {children}
    </Card>
  );
}

export interface Fact {
  label: string;
  value: ReactNode;
  testID?: string;
}

/** Label and value pairs; a value may be a link to the related record. */
export function FactList({ facts }: { facts: Fact[] }) {
  return (
    <View style={styles.facts}>
      {facts.map((f) => (
        <View key={f.label} style={styles.fact}>
          <Text style={type.small}>{f.label}</Text>
          {typeof f.value === 'string' || typeof f.value === 'number' ? (
            <Text style={type.body} testID={f.testID}>
              {f.value}
            </Text>
          ) : (
            <View testID={f.testID}>{f.value}</View>
          )}
        </View>
      ))}
    </View>
  );
}

/** An inline link to another page, tall enough to tap. */
export function TextLink({ href, label, testID }: { href: string; label: string; testID?: string }) {
  return (
    <Link href={href as never} testID={testID} style={styles.textLink}>
      {label}
    </Link>
  );
}

/** A link as a fact's value: its words sit where the other values' words sit; the tap area reaches below. */
export function FactLink({ href, label, testID }: { href: string; label: string; testID?: string }) {
  return (
    <Link href={href as never} testID={testID} style={[styles.textLink, styles.factLink]}>
      {label}
    </Link>
  );
}

export interface Relation {
  key: string;
  title: string;
  href?: string;
  detail?: string;
  aside?: ReactNode;
  /** Further links from the same row (a pairing's tube and connector). */
  links?: Array<{ label: string; href: string }>;
  testID?: string;
}

/** Related records, each one a link to its page; says so plainly when there are none. */
export function RelationList({ items, empty, testID }: { items: Relation[]; empty: string; testID?: string }) {
  if (items.length === 0) {
    return (
      <Text style={[type.body, { color: colors.inkMuted }]} testID={testID ? `${testID}-empty` : undefined}>
        {empty}
      </Text>
    );
  }
  return (
    <View role="list" style={styles.relations} testID={testID}>
      {items.map((item, i) => (
        <View role="listitem" key={item.key} style={[styles.relation, i > 0 && styles.relationRule]} testID={item.testID}>
          <View style={styles.relationMain}>
            {item.href ? <TextLink href={item.href} label={item.title} /> : <Text style={[type.label, styles.plainTitle]}>{item.title}</Text>}
            {item.detail || item.links?.length ? (
              <View style={styles.meta}>
                {item.detail ? <Text style={type.small}>{item.detail}</Text> : null}
                {item.links?.map((l) => (
                  <TextLink key={l.href} href={l.href} label={l.label} />
                ))}
              </View>
            ) : null}
          </View>
          {item.aside ? <View style={styles.aside}>{item.aside}</View> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.md },
  fact: { flexBasis: '42%', flexGrow: 1, minWidth: 140, gap: 2 },
  textLink: {
    display: 'flex' as never,
    alignSelf: 'flex-start',
    minHeight: minTouch,
    // A Text shown as flex lays out in a row: centre the words across it.
    alignItems: 'center',
    fontFamily: fonts.semibold,
    fontSize: 16,
    lineHeight: 22,
    color: colors.primary,
    textDecorationLine: 'underline',
  },
  factLink: { alignItems: 'flex-start' },
  relations: { gap: 0 },
  relation: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.xs },
  relationRule: { borderTopWidth: 1, borderTopColor: colors.line },
  relationMain: { flex: 1, minWidth: 0 },
  plainTitle: { paddingTop: space.sm },
  meta: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.lg },
  aside: { flexShrink: 0 },
});
