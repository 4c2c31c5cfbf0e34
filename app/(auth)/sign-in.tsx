import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { useDemoLoaded } from '@/components/queries/demo';
import { afterSignIn } from '@/components/session/after-sign-in';
import { SignInForm } from '@/components/session/sign-in-form';
import { SignInFrame } from '@/components/session/sign-in-frame';

export default function SignInScreen() {
  const router = useRouter();
  const demo = useDemoLoaded();
  const { next } = useLocalSearchParams<{ next?: string }>();
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Sign in · Ovalyard' }} />
      <SignInForm demo={demo} onSignedIn={() => router.replace(afterSignIn(next))} />
    </SignInFrame>
  );
}
