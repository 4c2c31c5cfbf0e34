import { Stack } from 'expo-router';
import { SignInFrame } from '@/components/session/sign-in-frame';
import { SignUpForm } from '@/components/session/sign-up-form';

export default function SignUpScreen() {
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Start your shop · Ovalyard' }} />
      <SignUpForm />
    </SignInFrame>
  );
}
