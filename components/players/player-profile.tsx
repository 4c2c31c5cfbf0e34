import type { Player } from '@/server/schemas';
import { formatHandedness, formatHandicap } from '../format';
import { Card } from '../ui/card';
import { DetailList } from '../ui/detail-list';

type PlayerProfileProps = { player: Player };

/** A player's profile as recorded by the fitter. */
export function PlayerProfile({ player }: PlayerProfileProps) {
  return (
    <Card>
      <DetailList
        items={[
          { label: 'E-mail', value: player.email, email: true },
          { label: 'Plays', value: formatHandedness(player.handedness) },
          { label: 'Handicap index', value: player.handicap === null ? null : formatHandicap(player.handicap) },
          { label: 'Height', value: player.heightCm === null ? null : `${player.heightCm} cm` },
          { label: 'Wrist to floor', value: player.wristToFloorCm === null ? null : `${player.wristToFloorCm} cm` },
          { label: 'Usual miss', value: player.usualMiss },
          { label: 'Goals', value: player.goals },
          { label: 'Sign-in', value: player.hasAccount ? 'Has a sign-in' : 'No sign-in yet' },
        ]}
      />
    </Card>
  );
}
