import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import { FIELD_LABELS, SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import type { UnitSystem } from '@/analysis/units';
import type { ShotSortKey } from '@/server/schemas';
import { unitText } from '../format-field';
import { useShotPageQuery, type ShotPageParams } from '../queries/analysis';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { ChipRow } from './chip-row';
import { PinnedTable } from './pinned-table';
import { DERIVED_MARK, shotCellText, shotStatusText } from './shot-table-cells';

type ShotTableProps = { fittingId: string; clubs: readonly string[]; units: UnitSystem };

const PAGE = 50;
/** Shown first, where a phone sees them without scrolling; the rest follow in canonical order. */
const FIRST: readonly ShotField[] = ['carry', 'offline', 'ballSpeed'];
const ALL = '';

/**
 * Every shot with every imported and derived field, sortable by any column, with its stray and
 * decision, in the user's units (L/R on sided fields, derived values marked), fetched a page at
 * a time from the shot table's own endpoint. The club and build column stays put.
 */
export function ShotTable({ fittingId, clubs, units }: ShotTableProps) {
  const [params, setParams] = useState<ShotPageParams>({ offset: 0, limit: PAGE, sort: 'row', dir: 'asc', club: null });
  const query = useShotPageQuery(fittingId, params);
  const sortBy = (key: string) =>
    setParams((p) => ({ ...p, offset: 0, sort: key as ShotSortKey, dir: p.sort === key && p.dir === 'asc' ? 'desc' : 'asc' }));
  const clubOptions = [{ value: ALL, label: 'All clubs' }, ...clubs.map((c) => ({ value: c, label: clubInfo(c)?.label ?? c }))];
  if (query.isPending) return <LoadingState label="Loading the shots…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const page = query.data;
  const sortOf = (key: string) => (params.sort === key ? params.dir : null);
  const fieldTitle = (f: ShotField) => FIELD_LABELS[f];
  const fieldColumn = (f: ShotField) => ({
    key: f,
    title: fieldTitle(f),
    unit: `${unitText(f, units)}${SIDE_FIELDS.has(f) ? `${unitText(f, units) ? ' ' : ''}L/R` : ''}`,
    widthPx: Math.max(88, fieldTitle(f).length * 8 + 24),
    sort: sortOf(f),
  });
  const first = FIRST.filter((f) => page.fields.includes(f));
  const rest = page.fields.filter((f) => !FIRST.includes(f));
  const columns = [
    { key: 'row', title: 'Row', widthPx: 56, sort: sortOf('row') },
    ...first.map(fieldColumn),
    { key: 'stray', title: 'Stray · figures', widthPx: 150, sort: sortOf('stray'), alignLeft: true },
    ...rest.map(fieldColumn),
  ];
  const rows = page.shots.map((s) => ({
    key: String(s.id),
    highlighted: s.stray !== null && !s.inFigures,
    pinned: (
      <>
        <AppText variant="bodyStrong" numberOfLines={1}>{clubInfo(s.club)?.label ?? s.club}</AppText>
        <AppText variant="caption" tone="muted" numberOfLines={1}>{s.build ?? 'No build named'}</AppText>
      </>
    ),
    cells: [
      <AppText key="row">{String(s.row)}</AppText>,
      ...first.map((f) => <AppText key={f}>{shotCellText(s, f, units)}</AppText>),
      <AppText key="stray" variant="caption" numberOfLines={2} style={{ color: s.inFigures ? colors.text : colors.caution }}>{shotStatusText(s)}</AppText>,
      ...rest.map((f) => <AppText key={f}>{shotCellText(s, f, units)}</AppText>),
    ],
  }));
  const last = Math.min(page.total, page.offset + page.shots.length);
  return (
    <View style={styles.box}>
      <ChipRow label="Club" value={params.club ?? ALL} options={clubOptions} onChange={(v) => setParams((p) => ({ ...p, offset: 0, club: v === ALL ? null : v }))} />
      <PinnedTable label="Shot table" pinnedTitle="Club · build" pinnedWidthPx={124} columns={columns} rows={rows} onSort={sortBy} />
      <AppText variant="caption" tone="muted">
        {`Shots ${page.total === 0 ? 0 : page.offset + 1}–${last} of ${page.total}, as measured in the bay. ${DERIVED_MARK} derived: computed from other fields or by the ball-flight model, not read from the file. L/R: left or right of the target line. Tap a column’s title to sort by it.`}
      </AppText>
      <View style={styles.pager}>
        <Button compact variant="secondary" title={`Previous ${PAGE}`} disabled={page.offset === 0} onPress={() => setParams((p) => ({ ...p, offset: Math.max(0, p.offset - PAGE) }))} />
        <Button compact variant="secondary" title={`Next ${PAGE}`} disabled={last >= page.total} onPress={() => setParams((p) => ({ ...p, offset: p.offset + PAGE }))} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  pager: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
