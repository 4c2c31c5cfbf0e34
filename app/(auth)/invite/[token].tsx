import { Stack, useLocalSearchParams } from 'expo-router';
import { InvitationForm } from '@/components/session/invitation-form';
import { SignInFrame } from '@/components/session/sign-in-frame';

export default function InviteScreen() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Invitation · Ovalyard' }} />
      <InvitationForm token={String(token)} />
    </SignInFrame>
  );
}
