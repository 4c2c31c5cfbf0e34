import type { BagClub } from '@/server/schemas';

/** A bag club as a save answers it (without the carry and wear the bag view adds). */
export type BagClubState = Omit<BagClub, 'carry' | 'wear' | 'updatedAt'>;
