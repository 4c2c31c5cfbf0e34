import type { Player } from '@/server/schemas';
import { cmTo } from '@/analysis/units';
import { formatHandedness, formatHandicap } from '../format';
import { useMe } from '../session/session-provider';
import { Card } from '../ui/card';
import { DetailList } from '../ui/detail-list';

type PlayerProfileProps = { player: Player };

/** A player's profile as recorded by the fitter. */
export function PlayerProfile({ player }: PlayerProfileProps) {
  const unit = useMe().lengthUnit;
  const length = (cm: number | null) => (cm === null ? null : `${Math.round(cmTo(cm, unit) * 10) / 10} ${unit}`);
  return (
    <Card>
      <DetailList
        items={[
          { label: 'E-mail', value: player.email, email: true },
          { label: 'Plays', value: formatHandedness(player.handedness) },
          { label: 'Handicap index', value: player.handicap === null ? null : formatHandicap(player.handicap) },
          { label: 'Height', value: length(player.heightCm) },
          { label: 'Wrist to floor', value: length(player.wristToFloorCm) },
          { label: 'Usual miss', value: player.usualMiss },
          { label: 'Goals', value: player.goals },
          { label: 'Sign-in', value: player.hasAccount ? 'Has a sign-in' : 'No sign-in yet' },
        ]}
      />
    </Card>
  );
}
