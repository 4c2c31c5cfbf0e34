import { Stack } from 'expo-router';
import { ForgotForm } from '@/components/session/forgot-form';
import { SignInFrame } from '@/components/session/sign-in-frame';

export default function ForgotScreen() {
  return (
    <SignInFrame>
      <Stack.Screen options={{ title: 'Forgot your password · Ovalyard' }} />
      <ForgotForm />
    </SignInFrame>
  );
}
