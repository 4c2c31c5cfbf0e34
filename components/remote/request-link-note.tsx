import { Platform } from 'react-native';
import { useRequestLinkQuery } from '../queries/fitting-course';
import { AppText } from '../ui/app-text';

/** The shop's public request page, for staff to share with their players. */
export function RequestLinkNote() {
  const query = useRequestLinkQuery();
  if (!query.data) return null;
  const origin = Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : '';
  return (
    <AppText variant="caption" tone="muted" selectable>
      {`Players ask for a remote fitting at ${origin}/request/${query.data.slug}`}
    </AppText>
  );
}
