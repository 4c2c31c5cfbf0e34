import { Tabs } from 'expo-router';
import type { ColorValue } from 'react-native';
import { canManageTeam, isStaff } from '@/components/session/permissions';
import { guardedScreen } from '@/components/session/route-guard';
import { useMe } from '@/components/session/session-provider';
import { tabHeaderOptions } from '@/components/ui/stack-options';
import { TabIcon, type TabIconName } from '@/components/ui/tab-icon';
import { colors, fonts } from '@/components/theme';

export { ErrorBoundary } from 'expo-router';

const icon = (name: TabIconName) =>
  function TabBarIcon({ color }: { color: ColorValue }) {
    return <TabIcon name={name} color={color} />;
  };

/** The tabs a role sees; the others are hidden (href: null), and the server refuses them anyway. */
export default function TabsLayout() {
  const me = useMe();
  const staff = isStaff(me.role);
  return (
    <Tabs
      screenLayout={guardedScreen}
      screenOptions={{
        ...tabHeaderOptions,
        sceneStyle: { backgroundColor: colors.paper },
        tabBarActiveTintColor: colors.accent,
        tabBarInactiveTintColor: colors.textMuted,
        tabBarStyle: { backgroundColor: colors.surface, borderTopColor: colors.border, minHeight: 56 },
        tabBarLabelStyle: { fontFamily: fonts.medium, fontSize: 12 },
      }}
    >
      <Tabs.Screen name="players" options={{ title: 'Players', tabBarIcon: icon('players'), href: staff ? undefined : null }} />
      <Tabs.Screen name="fittings" options={{ title: 'Fittings', tabBarIcon: icon('fittings'), href: staff ? undefined : null }} />
      <Tabs.Screen
        name="my-fittings"
        options={{ title: 'My fittings', tabBarIcon: icon('fittings'), href: staff ? null : undefined }}
      />
      <Tabs.Screen name="my-bag" options={{ title: 'My bag', tabBarIcon: icon('bag'), href: staff ? null : undefined }} />
      <Tabs.Screen
        name="team"
        options={{ title: 'Team', tabBarIcon: icon('team'), href: canManageTeam(me.role) ? undefined : null }}
      />
      <Tabs.Screen name="account" options={{ title: 'Account', tabBarIcon: icon('account') }} />
    </Tabs>
  );
}
