import type { UseQueryResult } from '@tanstack/react-query';
import { createColumnHelper, type ColumnDef, type ColumnHelper } from '@tanstack/react-table';
import { useRouter } from 'expo-router';
import { useEffect, useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ListParams, Page } from '@/shared/contract/records';
import { useLengthUnit } from '../data/me';
import { Screen } from '../screen';
import { colors, space, type } from '../theme';
import { DataTable, type TableSort } from '../ui/data-table';
import { Pager } from '../ui/pager';
import { SearchField } from '../ui/search-field';
import { EmptyState, ErrorState, LoadingState } from '../ui/states';
import { useIsWide } from '../use-layout';
import { ExportButton } from '../imports/export-button';
import { FilterBar, type FilterKind } from './filter-bar';
import { LinkButton } from '../ui/link-button';
import { UnitToggle } from './unit-toggle';
import { useCanEditRegistry } from './use-can-edit-registry';
import { queriesOf, REGISTRY_RESOURCES, type RecordOf, type RegistryResource } from './resources';
import { useListState } from './use-list-state';

type Show = ReturnType<typeof useLengthUnit>['show'];

/** One registry list's configuration: `registryList` makes its screen. */
export interface RegistryListConfig<T> {
  title: string;
  subtitle: string;
  /** What the search matches, as a placeholder: "Part number or material". */
  searchHint: string;
  /** The table's columns, built with the record's column helper; lengths shown in the person's unit. */
  columns: (col: ColumnHelper<T>, show: Show) => ColumnDef<T, never>[];
  defaultSort: TableSort;
  filters: readonly FilterKind[];
  /** The row's test id suffix: its part number or name. */
  rowTestID: (row: T) => string;
  /** What an engineer registers first, when the registry is empty: "with its thread, length and bore". */
  firstHint: string;
}

/** A registry list screen from its configuration. */
export function registryList<R extends RegistryResource>(resource: R, config: RegistryListConfig<RecordOf<R>>) {
  const col = createColumnHelper<RecordOf<R>>();
  return function ConfiguredList() {
    return <RegistryListScreen<RecordOf<R>> {...config} {...REGISTRY_RESOURCES[resource]} useList={queriesOf(resource).useList} resource={resource} col={col} />;
  };
}

interface RegistryListScreenProps<T> extends RegistryListConfig<T> {
  resource: RegistryResource;
  noun: { one: string; many: string };
  useList: (params: ListParams) => UseQueryResult<Page<T>>;
  showsLengths: boolean;
  col: ColumnHelper<T>;
}

/**
 * One registry list: debounced search, filters, server sorting and paging, a table on a wide screen and
 * cards on a phone, and its loading, error, empty and data states.
 */
function RegistryListScreen<T extends { id: string }>(props: RegistryListScreenProps<T>) {
  const { resource, title, subtitle, noun, searchHint, useList, defaultSort, filters, rowTestID, showsLengths, firstHint, col } = props;
  const { show } = useLengthUnit();
  const makeColumns = props.columns;
  const columns = useMemo(() => makeColumns(col, show) as ColumnDef<T, unknown>[], [makeColumns, col, show]);
  const wide = useIsWide();
  const router = useRouter();
  const canEdit = useCanEditRegistry();
  const state = useListState(defaultSort);
  const list = useList(state.query);
  const newHref = `/registry/${resource}/new`;

  // A page left empty (records removed meanwhile) moves back to the last page that has rows.
  const total = list.data?.total ?? 0;
  const lastPage = Math.max(1, Math.ceil(total / (list.data?.pageSize ?? 1)));
  const { page, setPage } = state;
  useEffect(() => {
    if (list.data && !list.isPlaceholderData && list.data.items.length === 0 && total > 0 && page > lastPage) setPage(lastPage);
  }, [list.data, list.isPlaceholderData, total, lastPage, page, setPage]);

  let body;
  if (list.isPending) {
    body = <LoadingState label={`Loading ${noun.many}…`} />;
  } else if (list.isError && !list.data) {
    body = <ErrorState error={list.error} onRetry={() => list.refetch()} />;
  } else if (list.data && list.data.total === 0) {
    if (state.narrowed) {
      const what = state.q ? `match “${state.q}”` : 'match these filters';
      body = (
        <EmptyState
          title={`No ${noun.many} ${what}`}
          next={
            state.q && Object.values(state.filters).some(Boolean)
              ? 'Clear the search and the filters to see them all.'
              : state.q
                ? 'Clear the search to see them all, or try a shorter part of the number.'
                : 'Clear the filters to see them all.'
          }
          action={{ label: state.q ? 'Clear the search' : 'Clear the filters', onPress: state.clearAll }}
        />
      );
    } else if (canEdit) {
      body = (
        <EmptyState
          title={`No ${noun.many} registered yet`}
          next={`Register the first ${noun.one} ${firstHint}.`}
          action={{ label: `Register the first ${noun.one}`, onPress: () => router.push(newHref as never) }}
        />
      );
    } else {
      body = <EmptyState title={`No ${noun.many} registered yet`} next={`Engineers register ${noun.many}; ask one to add the first.`} />;
    }
  } else if (list.data) {
    body = (
      <View style={styles.results}>
        {list.isError ? <ErrorState error={list.error} onRetry={() => list.refetch()} /> : null}
        <DataTable
          label={title}
          data={list.data.items}
          columns={columns}
          sort={state.sort}
          onSortChange={state.setSort}
          rowId={(r) => r.id}
          rowTestID={rowTestID}
          rowHref={(r) => `/registry/${resource}/${r.id}`}
          wide={wide}
          testID="registry-table"
          rowTestIDPrefix="registry-row"
        />
        <Pager page={state.page} pageSize={list.data.pageSize} total={list.data.total} onPage={state.setPage} noun={noun.many} busy={list.isFetching} />
      </View>
    );
  }

  return (
    <Screen
      title={title}
      subtitle={subtitle}
      testID={`registry-${resource}`}
      actions={
        <>
          {showsLengths ? <UnitToggle /> : null}
          <ExportButton resource={resource} params={state.query} />
          {canEdit ? <LinkButton href={newHref} label={`New ${noun.one}`} variant="primary" testID="registry-new" /> : null}
        </>
      }
    >
      <View style={[styles.tools, wide && styles.toolsWide]} aria-label={`Find ${noun.many}`} {...({ role: 'search' } as object)}>
        <View style={wide ? styles.searchWide : undefined}>
          <SearchField label={`Search ${noun.many}`} placeholder={searchHint} value={state.q} onSearch={state.setQ} testID="registry-search" />
        </View>
        {filters.length ? (
          <View style={[styles.filters, wide && styles.filtersWide]}>
            <Text style={type.label}>Filters</Text>
            <FilterBar kinds={filters} state={state} />
          </View>
        ) : null}
      </View>
      {list.isFetching && !list.isPending ? (
        <Text style={[type.small, styles.updating]} aria-live="polite" testID="registry-updating">
          Updating…
        </Text>
      ) : null}
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  tools: { gap: space.md },
  toolsWide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  searchWide: { flexBasis: 320, flexShrink: 0 },
  filters: { gap: space.xs },
  filtersWide: { flex: 1 },
  results: { gap: space.md },
  updating: { color: colors.inkMuted, marginBottom: -space.sm },
});
