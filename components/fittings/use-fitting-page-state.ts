import { useState } from 'react';
import type { AnalysisParams } from '../queries/analysis';

/** What the fitter has chosen on a fitting's page; kept while they switch views. */
export type FittingPageState = {
  includeStrays: boolean;
  setIncludeStrays: (v: boolean) => void;
  /** The course the figures are carried over to, or null (as measured). */
  to: AnalysisParams['to'];
  setTo: (to: AnalysisParams['to']) => void;
  club: string | null;
  setClub: (club: string) => void;
  /** Builds A and B of the head-to-head. */
  pair: [string, string] | null;
  setPair: (pair: [string, string]) => void;
  /** The odds targets the fitter typed (m); null: the shop's. */
  odds: NonNullable<AnalysisParams['odds']> | null;
  setOdds: (odds: NonNullable<AnalysisParams['odds']> | null) => void;
};

/** The state of a fitting's page, held by its screen so it survives switching views. */
export function useFittingPageState(): FittingPageState {
  const [includeStrays, setIncludeStrays] = useState(false);
  const [to, setTo] = useState<AnalysisParams['to']>(null);
  const [club, setClub] = useState<string | null>(null);
  const [pair, setPair] = useState<[string, string] | null>(null);
  const [odds, setOdds] = useState<NonNullable<AnalysisParams['odds']> | null>(null);
  return { includeStrays, setIncludeStrays, to, setTo, club, setClub, pair, setPair, odds, setOdds };
}
