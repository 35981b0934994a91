import { getCoreRowModel, useReactTable, type Cell, type Column, type ColumnDef, type RowData, type SortingState } from '@tanstack/react-table';
import { Link } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, minTouch, radius, space, type } from '../theme';
import { Button } from './button';
import { ChoiceChips } from './choice-chips';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars -- the type parameters must be TanStack's own for the declarations to merge
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Relative width of the column on a wide screen (default 1). */
    flex?: number;
    align?: 'left' | 'right';
    /** The row's name: a link to its detail on a wide screen, the card's title on a phone. */
    primary?: boolean;
    /** Left off the phone card (the card keeps only the fields that matter at the dock). */
    hideOnPhone?: boolean;
  }
}

export interface TableSort {
  /** The column id, which is also the server's sort key. */
  key: string;
  order: 'asc' | 'desc';
}

interface DataTableProps<T> {
  /** What the table lists, for assistive technology: "Dip tubes". */
  label: string;
  data: T[];
  // TanStack's column value type is per column: the table takes columns of any value type.
  columns: ColumnDef<T, unknown>[];
  sort: TableSort;
  onSortChange: (sort: TableSort) => void;
  /** Stable row id (the record id). */
  rowId: (row: T) => string;
  /** Suffix of each row's test id, e.g. the part number; the row id when not given. */
  rowTestID?: (row: T) => string;
  rowHref: (row: T) => string;
  /** Table on a wide screen, cards on a phone. */
  wide: boolean;
  testID?: string;
  rowTestIDPrefix?: string;
}

const blank = (v: unknown): string => {
  if (v === null || v === undefined || v === '') return '—';
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
};

const headerText = <T,>(column: Column<T, unknown>): string => {
  const h = column.columnDef.header;
  return typeof h === 'string' ? h : column.id;
};

/** The column's rendering of one cell; plain values (the default) become text in the table's type. */
function cellValue<T>(cell: Cell<T, unknown>): ReactNode {
  // Called as a function rather than through flexRender, which would mount it as a component and hide
  // whether it returned plain text.
  const render = cell.column.columnDef.cell;
  return typeof render === 'function' ? (render(cell.getContext()) as ReactNode) : (render as ReactNode);
}

function CellContent<T>({ cell, style }: { cell: Cell<T, unknown>; style?: object }) {
  const out = cellValue(cell);
  if (typeof out === 'string' || typeof out === 'number') return <Text style={[styles.cellText, style]}>{out}</Text>;
  return <>{out}</>;
}

/**
 * A server-paged, server-sorted table (TanStack Table with manual sorting and paging): column headers sort
 * on a wide screen; on a phone each row becomes a card and a sort chooser takes the headers' place.
 */
export function DataTable<T>({ label, data, columns, sort, onSortChange, rowId, rowTestID, rowHref, wide, testID = 'data-table', rowTestIDPrefix = 'data-row' }: DataTableProps<T>) {
  const sorting: SortingState = [{ id: sort.key, desc: sort.order === 'desc' }];
  const table = useReactTable<T>({
    data,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => rowId(row),
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    sortDescFirst: false,
    defaultColumn: { enableSorting: false, cell: (info) => blank(info.getValue()) },
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      if (first) onSortChange({ key: first.id, order: first.desc ? 'desc' : 'asc' });
    },
  });
  const rows = table.getRowModel().rows;
  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort());

  if (!wide) {
    return (
      <View style={styles.cards}>
        {sortable.length > 1 ? <SortChooser columns={sortable} sort={sort} onSortChange={onSortChange} testID={testID} /> : null}
        <View role="list" aria-label={label} testID={testID} style={styles.cards}>
          {rows.map((row) => {
            const cells = row.getVisibleCells();
            const title = cells.find((c) => c.column.columnDef.meta?.primary) ?? cells[0]!;
            const fields = cells.filter((c) => c !== title && !c.column.columnDef.meta?.hideOnPhone);
            return (
              <View role="listitem" key={row.id}>
                <Link href={rowHref(row.original) as never} testID={`${rowTestIDPrefix}-${rowTestID ? rowTestID(row.original) : row.id}`} style={styles.card}>
                  <CellContent cell={title} style={styles.cardTitle} />
                  <View style={styles.fields}>
                    {fields.map((c) => (
                      <View key={c.id} style={styles.field}>
                        <Text style={type.small}>{headerText(c.column)}</Text>
                        <CellContent cell={c} />
                      </View>
                    ))}
                  </View>
                </Link>
              </View>
            );
          })}
        </View>
      </View>
    );
  }

  return (
    <View role="table" aria-label={label} testID={testID} style={styles.table}>
      {table.getHeaderGroups().map((group) => (
        <View role="row" key={group.id} style={[styles.row, styles.headRow]}>
          {group.headers.map((header) => {
            const col = header.column;
            const meta = col.columnDef.meta;
            const sorted = col.getIsSorted();
            const text = headerText(col);
            const ariaSort = sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : col.getCanSort() ? 'none' : undefined;
            return (
              <View role="columnheader" key={header.id} style={[styles.cell, { flex: meta?.flex ?? 1 }]} {...({ 'aria-sort': ariaSort } as object)}>
                {col.getCanSort() ? (
                  <Pressable
                    role="button"
                    aria-label={`${text}: sort ${sorted === 'asc' ? 'descending' : 'ascending'}`}
                    testID={`${testID}-sort-${col.id}`}
                    onPress={() => col.toggleSorting(sorted === 'asc')}
                    style={({ focused, hovered }: { pressed: boolean; focused?: boolean; hovered?: boolean }) => [
                      styles.sortButton,
                      meta?.align === 'right' && styles.sortButtonRight,
                      hovered && styles.sortHover,
                      focused && styles.focusRing,
                    ]}
                  >
                    <Text style={[styles.headText, sorted && styles.headTextOn]}>{text}</Text>
                    <Text style={[styles.arrow, sorted && styles.headTextOn]} aria-hidden>
                      {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                    </Text>
                  </Pressable>
                ) : (
                  <Text style={[styles.headText, styles.headPlain, meta?.align === 'right' && styles.right]}>{text}</Text>
                )}
              </View>
            );
          })}
        </View>
      ))}
      {rows.map((row, i) => (
        <View role="row" key={row.id} testID={`${rowTestIDPrefix}-${rowTestID ? rowTestID(row.original) : row.id}`} style={[styles.row, i % 2 === 1 && styles.rowAlt]}>
          {row.getVisibleCells().map((cell) => {
            const meta = cell.column.columnDef.meta;
            const align = meta?.align === 'right' ? styles.right : null;
            return (
              <View role="cell" key={cell.id} style={[styles.cell, styles.bodyCell, { flex: meta?.flex ?? 1 }]}>
                {meta?.primary ? (
                  <Link href={rowHref(row.original) as never} style={[styles.link, align]}>
                    {cellValue(cell)}
                  </Link>
                ) : (
                  <CellContent cell={cell} style={align ?? undefined} />
                )}
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

function SortChooser<T>({ columns, sort, onSortChange, testID }: { columns: Column<T, unknown>[]; sort: TableSort; onSortChange: (s: TableSort) => void; testID: string }) {
  const [open, setOpen] = useState(false);
  const current = columns.find((c) => c.id === sort.key);
  return (
    <View style={styles.sortBox}>
      <View style={styles.sortBar}>
        <Text style={[type.body, styles.sortSummary]} testID={`${testID}-sort-summary`}>
          Sorted by <Text style={{ fontFamily: fonts.semibold }}>{current ? headerText(current) : sort.key}</Text>, {sort.order === 'asc' ? 'ascending' : 'descending'}
        </Text>
        <Button label={open ? 'Done' : 'Sort'} variant="secondary" aria-expanded={open} onPress={() => setOpen((o) => !o)} testID={`${testID}-sort-menu`} />
      </View>
      {open ? (
        <View style={styles.sortPanel}>
          <ChoiceChips
            label="Sort by"
            options={columns.map((c) => ({ value: c.id, label: headerText(c) }))}
            value={sort.key}
            onChange={(key) => onSortChange({ key, order: sort.order })}
            testID={`${testID}-sort-by`}
          />
          <ChoiceChips
            label="Order"
            options={[
              { value: 'asc', label: 'Ascending' },
              { value: 'desc', label: 'Descending' },
            ]}
            value={sort.order}
            onChange={(order) => onSortChange({ key: sort.key, order })}
            testID={`${testID}-sort-order`}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'stretch', borderBottomWidth: 1, borderBottomColor: colors.line },
  rowAlt: { backgroundColor: colors.paper },
  headRow: { backgroundColor: colors.surfaceSunk, borderBottomColor: colors.inkMuted },
  cell: { paddingHorizontal: space.sm, justifyContent: 'center', minWidth: 0 },
  bodyCell: { paddingVertical: space.sm, minHeight: minTouch },
  headText: { fontFamily: fonts.semibold, fontSize: 14, lineHeight: 18, color: colors.ink },
  headTextOn: { color: colors.primary },
  headPlain: { paddingVertical: space.md, paddingHorizontal: space.xs },
  arrow: { fontFamily: fonts.semibold, fontSize: 12, color: colors.inkMuted },
  sortButton: { minHeight: minTouch, flexDirection: 'row', alignItems: 'center', gap: space.xs, paddingHorizontal: space.xs, borderRadius: radius.sm },
  sortButtonRight: { justifyContent: 'flex-end' },
  sortHover: { backgroundColor: colors.surfaceHover },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 } as object,
  right: { textAlign: 'right' },
  // Long e-mail addresses and part numbers wrap inside their column instead of running into the next.
  cellText: { fontFamily: fonts.regular, fontSize: 15, lineHeight: 20, color: colors.ink, overflowWrap: 'anywhere' } as object,
  link: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 20, color: colors.primary, textDecorationLine: 'underline', overflowWrap: 'anywhere' } as object,
  cards: { gap: space.sm },
  card: {
    display: 'flex' as never,
    flexDirection: 'column',
    gap: space.sm,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.lg,
    padding: space.md,
    minHeight: minTouch,
  },
  cardTitle: { fontFamily: fonts.semibold, fontSize: 17, color: colors.primary, textDecorationLine: 'underline' },
  fields: { flexDirection: 'row', flexWrap: 'wrap', rowGap: space.sm, columnGap: space.lg },
  field: { minWidth: 130, flexGrow: 1, flexBasis: '40%' },
  sortBox: { gap: space.sm },
  sortBar: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  sortSummary: { flexShrink: 1 },
  sortPanel: { gap: space.md, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, padding: space.md },
});
