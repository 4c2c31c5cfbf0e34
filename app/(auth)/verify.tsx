import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { SignInFrame } from '@/components/session/sign-in-frame';
import { VerifyEmail } from '@/components/session/verify-email';

export default function VerifyScreen() {
  const router = useRouter();
  const { token } = useLocalSearchParams<{ token?: string | string[] }>();
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Confirm your e-mail · Ovalyard' }} />
      <VerifyEmail token={Array.isArray(token) ? token[0] : token} onSignIn={() => router.replace('/sign-in')} />
    </SignInFrame>
  );
}
