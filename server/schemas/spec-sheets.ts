import type { BagCheck } from '../../analysis/conformance';
import type { BagLadderRung } from '../../analysis/ladder';
import type { ChoiceFigures } from '../../analysis/bag';
import type { BuildSpecValues } from './build-spec';

export type SpecSheetState = 'draft' | 'sent' | 'accepted';

/** The figures behind one choice (analysis/bag/spec-sheet-text.ts defines them, beside their words). */
export type { ChoiceFigures };

/** One chosen build on the sheet. */
export interface SpecSheetChoice {
  club: string;
  clubLabel: string;
  buildLabel: string;
  spec: BuildSpecValues;
  /** What it does to the bag: added, replaces a club (its label), or nothing new. */
  change: { kind: 'add' } | { kind: 'replace'; replacedClubLabel: string } | null;
  figures: ChoiceFigures | null;
}

/** The spec sheet of a fitting: the same content on the page, in the PDF and in the e-mail. */
export interface SpecSheet {
  /** Null until it is sent (a draft is computed from the fitting as it is). */
  id: string | null;
  fittingId: string;
  state: SpecSheetState;
  shopName: string;
  playerId: string;
  playerName: string;
  fitterName: string | null;
  fittingDate: string;
  venue: 'indoor' | 'outdoor';
  choices: SpecSheetChoice[];
  /** Clubs the change takes out of the bag (their labels). */
  takenOut: string[];
  /** The bag's ladder after the change. */
  ladder: BagLadderRung[];
  /** Labels of the ladder's clubs, by bag club id (for the page and the PDF). */
  ladderLabels: Record<string, string>;
  checks: BagCheck[];
  /** The workshop caution, in the words the sheet prints. */
  caution: string;
  sentAt: string | null;
  acceptedAt: string | null;
  /** Whether the chosen builds were confirmed into the bag. */
  confirmed: boolean;
}

/** The words of the workshop caution, one text for page, PDF and e-mail. */
export const WORKSHOP_CAUTION =
  'Changing a club — a hosel setting, added mass, the length or the lie — is workshop work: follow the head maker’s instructions and tighten with the proper torque tool. Conformance notes are reminders only: the governing bodies’ rules and the committee in charge of a competition decide.';
