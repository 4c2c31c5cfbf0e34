import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { FittingAnalysis } from '@/server/schemas';
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
  });

export const fittingAnalysisQuery = (fittingId: string, p: AnalysisParams) =>
  queryOptions({ queryKey: analysisKeys.detail(fittingId, p), queryFn: () => getFittingAnalysis(fittingId, p) });

/** The analysis; while new parameters load, the previous answer stays on screen. */
export function useFittingAnalysisQuery(fittingId: string, p: AnalysisParams, options: { enabled?: boolean } = {}) {
  return useQuery({ ...fittingAnalysisQuery(fittingId, p), placeholderData: keepPreviousData, enabled: options.enabled ?? true });
}

/** A fitter keeps or drops a shot (null: back to the stray rules). */
export function useShotDecisionMutation(fittingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ shotId, decision }: { shotId: number; decision: 'keep' | 'drop' | null }) =>
      apiRequest<{ id: number; decision: 'keep' | 'drop' | null }>('PATCH', `/shots/${shotId}`, { body: { decision } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: [...analysisKeys.all, fittingId] }),
  });
}
