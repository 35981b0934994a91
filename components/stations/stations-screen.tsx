import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import type { StationRecord, TubeSetRecord } from '@/shared/contract/records';
import { stationQueries } from '../data/stations';
import { tubeSetQueries } from '../data/tube-sets';
import { SectionTitle } from '../ui/section-title';
import { Screen } from '../screen';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { Card } from '../ui/card';
import { HandlingCaution } from '../ui/handling-caution';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { SetStateChip } from './set-state';

/** The tube-set list also carries the lot and drum a set is in. */
type SetRow = TubeSetRecord & { currentLotNumber?: string | null; currentDrumSerial?: string | null };

const TAPPING: Record<StationRecord['tapping'], string> = { 'one-opening': 'one-opening tapping', 'two-opening': 'two-opening tapping' };

/** Every station with its online and standby drums and its three tube sets. */
export function StationsScreen() {
  const wide = useIsWide();
  const stations = stationQueries.useList({ pageSize: 200, sort: 'name' });
  const sets = tubeSetQueries.useList({ pageSize: 200 });
  const failed = stations.isError ? stations : sets.isError ? sets : null;

  return (
    <Screen title="Stations" subtitle="Each drum position: the drum online, the drum in standby, and the tube sets rotating through them." testID="stations-screen">
      <HandlingCaution pressurised />
      {stations.isPending || sets.isPending ? (
        <LoadingState label="Loading stations…" />
      ) : failed ? (
        <ErrorState error={failed.error} onRetry={() => (stations.refetch(), sets.refetch())} />
      ) : stations.data!.items.length === 0 ? (
        <EmptyState title="No stations yet" next="An engineer registers the site's drum stations and their tube sets; they appear here to rotate." />
      ) : (
        <View style={[styles.grid, wide && styles.gridWide]} testID="stations-list">
          {stations.data!.items.map((s) => (
            <StationCard key={s.id} station={s} sets={(sets.data!.items as SetRow[]).filter((t) => t.stationId === s.id)} wide={wide} />
          ))}
        </View>
      )}
    </Screen>
  );
}

function DrumLine({ title, set, testID }: { title: string; set: SetRow | undefined; testID: string }) {
  return (
    <View style={styles.drum} testID={testID}>
      <Text style={type.small}>{title}</Text>
      {set ? (
        <Text style={type.body}>
          <Text style={styles.strong}>Lot {set.currentLotNumber ?? 'not recorded'}</Text>
          {set.currentDrumSerial ? `, drum ${set.currentDrumSerial}` : ''} · {set.label}
        </Text>
      ) : (
        <Text style={[type.body, { color: colors.inkMuted }]}>No drum</Text>
      )}
    </View>
  );
}

function StationCard({ station, sets, wide }: { station: StationRecord; sets: SetRow[]; wide: boolean }) {
  const online = sets.find((t) => t.state === 'online');
  const standby = sets.find((t) => t.state === 'standby');
  return (
    <Card style={wide ? styles.cardWide : undefined} testID={`station-${station.name}`}>
      <Link href={`/stations/${station.id}` as never} testID={`station-link-${station.name}`} style={styles.titleLink}>
        <Text style={styles.title}>{station.name}</Text>
      </Link>
      <Text style={type.small}>
        {station.bay} · {TAPPING[station.tapping]} · head {station.connectorPartNumber ?? 'none installed'}
      </Text>
      <View style={styles.drums}>
        <DrumLine title="Online drum" set={online} testID={`station-${station.name}-online`} />
        <DrumLine title="Standby drum" set={standby} testID={`station-${station.name}-standby`} />
      </View>
      <SectionTitle>Tube sets</SectionTitle>
      {sets.length === 0 ? (
        <Text style={type.body}>No tube sets registered for this station.</Text>
      ) : (
        <View role="list" style={styles.sets}>
          {sets.map((t) => (
            <View role="listitem" key={t.id} style={styles.set} testID={`station-${station.name}-set-${t.label}`}>
              <Text style={[type.label, styles.setLabel]}>{t.label}</Text>
              <SetStateChip state={t.state} />
              <Text style={[type.small, styles.shrink]}>{t.dipTubePartNumber}</Text>
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.lg },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cardWide: { flexBasis: '45%', flexGrow: 1, minWidth: 380 },
  titleLink: { display: 'flex' as never, minHeight: minTouch, justifyContent: 'center', alignSelf: 'flex-start' },
  title: { fontFamily: fonts.bold, fontSize: 20, color: colors.primary, textDecorationLine: 'underline', textAlign: 'left' },
  drums: { gap: space.sm, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunk },
  drum: { gap: 2 },
  strong: { fontFamily: fonts.semibold },
  sets: { gap: space.xs },
  set: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap', minHeight: 32 },
  setLabel: { minWidth: 52 },
  shrink: { flexShrink: 1 },
});
