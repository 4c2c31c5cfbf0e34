import type { Intake } from '@/server/schemas';
import { formatDateTime, formatHandicap } from '../format';
import { DetailList } from '../ui/detail-list';
import { lengthText, type LengthUnit } from './intake-form-values';

type IntakeSummaryProps = { intake: Intake; unit: LengthUnit };

/** The player's intake as the fitter reads it (lengths in the reader's units). */
export function IntakeSummary({ intake, unit }: IntakeSummaryProps) {
  return (
    <DetailList
      items={[
        { label: 'Plays', value: intake.handedness === 'left' ? 'Left-handed' : 'Right-handed' },
        { label: 'Height', value: `${lengthText(intake.heightCm, unit)} ${unit}` },
        { label: 'Wrist to floor', value: `${lengthText(intake.wristToFloorCm, unit)} ${unit}` },
        { label: 'Handicap index', value: intake.handicap === null ? null : formatHandicap(intake.handicap) },
        { label: 'Usual miss', value: intake.usualMiss },
        { label: 'Ball flight now', value: intake.ballFlightNow },
        { label: 'Wanted', value: intake.ballFlightWanted },
        { label: 'Wants from the fitting', value: intake.wishes },
        { label: 'Sent', value: formatDateTime(intake.submittedAt) },
      ]}
    />
  );
}
