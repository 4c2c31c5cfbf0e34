import { AppText } from '../ui/app-text';
import { Notice } from '../ui/notice';

/** A short caution for the bay, in our own words. */
export function BaySafetyNote() {
  return (
    <Notice tone="caution" title="Before you hit">
      <AppText>
        Warm up before a long session. Keep clear of anyone swinging a club, and mind balls rebounding off the screen, the
        mat and the bay walls.
      </AppText>
    </Notice>
  );
}
