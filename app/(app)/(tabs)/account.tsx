import { useRouter } from 'expo-router';
import { SignOutButtons } from '@/components/account/sign-out-buttons';
import { QuantityUnitsChoice } from '@/components/account/quantity-units-choice';
import { UnitsChoice } from '@/components/account/units-choice';
import { formatRole } from '@/components/format';
import { useMe } from '@/components/session/session-provider';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DetailList } from '@/components/ui/detail-list';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';

export default function AccountScreen() {
  const router = useRouter();
  const me = useMe();
  const playerId = me.playerId;
  return (
    <Screen>
      <Section title="You">
        <Card>
          <DetailList
            items={[
              { label: 'Name', value: me.name },
              { label: 'E-mail', value: me.email, email: true },
              { label: 'Shop', value: me.shop.name },
              { label: 'Role', value: formatRole(me.role) },
            ]}
          />
          {playerId ? (
            <Button
              title="My profile"
              variant="secondary"
              compact
              onPress={() => router.push({ pathname: '/players/[id]', params: { id: playerId } })}
            />
          ) : null}
        </Card>
      </Section>
      <Section title="Preferences">
        <Card>
          <UnitsChoice units={me.units} />
          <QuantityUnitsChoice me={me} />
        </Card>
      </Section>
      <Section title="Sign out">
        <SignOutButtons />
      </Section>
    </Screen>
  );
}
