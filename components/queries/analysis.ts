import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FittingAnalysis, ShotPage, ShotSortKey } from '@/server/schemas';
import { api, apiRequest } from '../api-client';
import { fittingKeys } from './fittings';

/** What the analysis of a fitting is asked for. */
export type AnalysisParams = {
  level: number;
  includeStrays: boolean;
  /** Two groups to compare, each "CLUB|BUILD". */
  compare: [string, string] | null;
  /** Course conditions to carry the figures over to. */
  to: { altitudeM?: number; temperatureC?: number; humidityPct?: number; firmness?: 'soft' | 'normal' | 'firm' } | null;
  /** On-target odds asked for on the page (m); null: the shop's. */
  odds?: { fairwayWidthM?: number; greenRadiusM?: number; target?: { club: string; carryM: number } } | null;
};

export const analysisKeys = {
  all: [...fittingKeys.all, 'analysis'] as const,
  detail: (fittingId: string, p: AnalysisParams) => [...analysisKeys.all, fittingId, p] as const,
};

const num = (v: number | undefined) => (v === undefined ? undefined : String(v));

export const getFittingAnalysis = (fittingId: string, p: AnalysisParams) =>
  api.get<FittingAnalysis>(`/fittings/${encodeURIComponent(fittingId)}/analysis`, {
    level: String(p.level),
    all: p.includeStrays ? '1' : '0',
    a: p.compare?.[0],
    b: p.compare?.[1],
    toAltitudeM: num(p.to?.altitudeM),
    toTemperatureC: num(p.to?.temperatureC),
    toHumidityPct: num(p.to?.humidityPct),
    toFirmness: p.to?.firmness,
    fairwayWidthM: num(p.odds?.fairwayWidthM),
    greenRadiusM: num(p.odds?.greenRadiusM),
    targetClub: p.odds?.target?.club,
    targetCarryM: num(p.odds?.target?.carryM),
  });

export const fittingAnalysisQuery = (fittingId: string, p: AnalysisParams) =>
  queryOptions({ queryKey: analysisKeys.detail(fittingId, p), queryFn: () => getFittingAnalysis(fittingId, p) });

/** The analysis; while new parameters load, the previous answer stays on screen. */
export function useFittingAnalysisQuery(fittingId: string, p: AnalysisParams, options: { enabled?: boolean } = {}) {
  return useQuery({ ...fittingAnalysisQuery(fittingId, p), placeholderData: keepPreviousData, enabled: options.enabled ?? true });
}

/** What one page of the shot table is asked for. */
export type ShotPageParams = { offset: number; limit: number; sort: ShotSortKey; dir: 'asc' | 'desc'; club: string | null };

export const shotKeys = {
  all: [...fittingKeys.all, 'shots'] as const,
  page: (fittingId: string, p: ShotPageParams) => [...shotKeys.all, fittingId, p] as const,
};

export const getShotPage = (fittingId: string, p: ShotPageParams) =>
  api.get<ShotPage>(`/fittings/${encodeURIComponent(fittingId)}/shots`, {
    offset: String(p.offset),
    limit: String(p.limit),
    sort: p.sort,
    dir: p.dir,
    club: p.club ?? undefined,
  });

/** One page of the shot table; the previous page stays on screen while the next loads. */
export function useShotPageQuery(fittingId: string, p: ShotPageParams) {
  return useQuery({ queryKey: shotKeys.page(fittingId, p), queryFn: () => getShotPage(fittingId, p), placeholderData: keepPreviousData });
}

/** Where the CSV exports download from (fitter and owner). */
export const exportPaths = (fittingId: string) => ({
  shots: `/api/fittings/${encodeURIComponent(fittingId)}/shots.csv`,
  groups: `/api/fittings/${encodeURIComponent(fittingId)}/groups.csv`,
});

/** A fitter keeps or drops a shot (null: back to the stray rules). */
export function useShotDecisionMutation(fittingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ shotId, decision }: { shotId: number; decision: 'keep' | 'drop' | null }) =>
      apiRequest<{ id: number; decision: 'keep' | 'drop' | null }>('PATCH', `/shots/${shotId}`, { body: { decision } }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: [...analysisKeys.all, fittingId] }),
        queryClient.invalidateQueries({ queryKey: [...shotKeys.all, fittingId] }),
      ]),
  });
}
