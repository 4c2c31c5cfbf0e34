import { clubInfo } from '@/analysis/clubs';
import type { ShotField } from '@/analysis/fields';
import type { GroupAnalysis } from '@/analysis/session';
import type { UnitSystem } from '@/analysis/units';
import { AppText } from '../ui/app-text';
import { fieldNumber, MISSING, unitText } from '../format-field';
import { PinnedTable } from './pinned-table';

type GroupTableProps = { groups: readonly GroupAnalysis[]; units: UnitSystem; selectedClub?: string | null };

const COLUMNS: { field: ShotField | 'smash'; title: string }[] = [
  { field: 'clubSpeed', title: 'Club speed' },
  { field: 'ballSpeed', title: 'Ball speed' },
  { field: 'smash', title: 'Smash' },
  { field: 'launchAngle', title: 'Launch' },
  { field: 'spinRate', title: 'Spin' },
  { field: 'spinAxis', title: 'Spin axis' },
  { field: 'carry', title: 'Carry' },
  { field: 'offline', title: 'Offline' },
];

const percent = (p: number | null) => (p === null ? MISSING : `${Math.round(100 * p)}%`);

function cell(g: GroupAnalysis, field: ShotField | 'smash', units: UnitSystem): { mean: string; sd: string } {
  const s = field === 'smash' ? g.smashFactor : g.fields[field];
  const f: ShotField = field === 'smash' ? 'smashFactor' : field;
  if (!s) return { mean: MISSING, sd: '' };
  const mean = fieldNumber(f === 'offline' ? Math.abs(s.mean) : s.mean, f, units);
  const side = f === 'offline' && Number(mean) !== 0 ? (s.mean < 0 ? ' L' : ' R') : '';
  return { mean: `${mean}${side}`, sd: s.sd == null ? '' : `±${fieldNumber(s.sd, f, units)}` };
}

/**
 * Every group (club × build): shots, kept, the key means ± sd and the on-target odds, in the
 * user's units; offline with L/R. The club and build column stays put while the rest scrolls.
 */
export function GroupTable({ groups, units, selectedClub }: GroupTableProps) {
  const columns = [
    { key: 'kept', title: 'Shots', widthPx: 64 },
    ...COLUMNS.map((c) => ({ key: c.field, title: c.title, unit: c.field === 'smash' ? undefined : unitText(c.field, units), widthPx: 96 })),
    { key: 'fairway', title: 'Fairway', widthPx: 76 },
    { key: 'green', title: 'Green', widthPx: 70 },
  ];
  const rows = groups.map((g) => ({
    key: `${g.club}|${g.build ?? ''}`,
    highlighted: g.club === selectedClub,
    pinned: (
      <>
        <AppText variant="bodyStrong" numberOfLines={1}>{clubInfo(g.club)?.label ?? g.club}</AppText>
        <AppText variant="caption" tone="muted" numberOfLines={1}>{g.build ?? 'No build named'}</AppText>
      </>
    ),
    cells: [
      <AppText key="kept">{g.kept !== g.n ? `${g.kept}/${g.n}` : String(g.n)}</AppText>,
      ...COLUMNS.map((c) => {
        const v = cell(g, c.field, units);
        return (
          <>
            <AppText>{v.mean}</AppText>
            <AppText variant="caption" tone="muted">{v.sd}</AppText>
          </>
        );
      }),
      <AppText key="fairway">{percent(g.odds.fairway.p)}</AppText>,
      <AppText key="green">{percent(g.odds.green.p)}</AppText>,
    ],
  }));
  return <PinnedTable label="Groups table" pinnedTitle="Club · build" pinnedWidthPx={124} columns={columns} rows={rows} />;
}
