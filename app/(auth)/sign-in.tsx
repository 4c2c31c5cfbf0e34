import { Stack, useRouter } from 'expo-router';
import { SignInForm } from '@/components/session/sign-in-form';
import { SignInFrame } from '@/components/session/sign-in-frame';

export default function SignInScreen() {
  const router = useRouter();
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Sign in · Ovalyard' }} />
      <SignInForm onSignedIn={() => router.replace('/')} />
    </SignInFrame>
  );
}
