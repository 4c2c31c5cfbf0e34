import { AppText } from '../ui/app-text';
import { Notice } from '../ui/notice';

/** A short caution for changes made to a club, in our own words. */
export function WorkshopCaution() {
  return (
    <Notice tone="caution" title="Workshop work">
      <AppText>
        Moving a hosel setting, adding mass or changing the length is a job for the workshop: follow the head maker’s
        instructions and tighten with the proper torque tool.
      </AppText>
    </Notice>
  );
}
