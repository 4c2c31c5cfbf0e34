import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ResetForm } from '@/components/session/reset-form';
import { ResetLinkIncomplete } from '@/components/session/reset-link-incomplete';
import { SignInFrame } from '@/components/session/sign-in-frame';

export default function ResetScreen() {
  const router = useRouter();
  const { token } = useLocalSearchParams<{ token?: string | string[] }>();
  const value = Array.isArray(token) ? token[0] : token;
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Set a new password · Ovalyard' }} />
      {value ? <ResetForm token={value} onSignIn={() => router.replace('/sign-in')} /> : <ResetLinkIncomplete />}
    </SignInFrame>
  );
}
