import { useLocalSearchParams } from 'expo-router';
import { RequestPanel } from '@/components/remote/request-panel';
import { SignInFrame } from '@/components/session/sign-in-frame';

/** /request/<slug>: a shop's public page where its players ask for a remote fitting. */
export default function RequestScreen() {
  const { slug = '' } = useLocalSearchParams<{ slug?: string }>();
  return (
    <SignInFrame>
      <RequestPanel slug={slug} />
    </SignInFrame>
  );
}
