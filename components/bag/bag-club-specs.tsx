import { specRows } from '@/analysis/bag';
import type { UnitSystem } from '@/analysis/units';
import type { BagClub } from '@/server/schemas';
import { formatDate } from '../format';
import { DetailList } from '../ui/detail-list';
import { STATUS_WORDS } from './bag-words';
import { carryText } from './carry-text';
import { LengthNotes } from '../builds/length-notes';
import { lengthConformanceNotes } from '../builds/conformance';

/** A bag club's status, carry, date in and every spec, as a list. */
export function BagClubSpecs({ club, units }: { club: BagClub; units: UnitSystem }) {
  return (
    <>
      <DetailList
        items={[
          { label: 'Status', value: STATUS_WORDS[club.status] },
          { label: 'Carry', value: carryText(club.carry, units) },
          { label: 'In since', value: club.inBagSince ? formatDate(club.inBagSince) : null },
          ...specRows(club),
        ]}
      />
      <LengthNotes notes={lengthConformanceNotes(club.club, club.lengthIn)} />
    </>
  );
}
