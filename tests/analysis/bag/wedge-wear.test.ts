import { DEFAULT_WEDGE_WEAR_LIMITS, wedgeWearReminder } from '@/analysis/bag';

// Common practice, no source: grooves wear with use; the shop sets the counts.
const limits = { rounds: 60, practiceSessions: 40 };

describe('wedgeWearReminder', () => {
  it('wedgeWearReminder of a wedge past the shop’s round count names the rounds', () => {
    expect(wedgeWearReminder('W56', 61, 10, limits)).toEqual({ over: ['rounds'], roundsSince: 61, practiceSessionsSince: 10 });
  });

  it('wedgeWearReminder of a named wedge past both counts names both', () => {
    expect(wedgeWearReminder('SW', 70, 41, limits)?.over).toEqual(['rounds', 'practice']);
  });

  it('wedgeWearReminder at the counts themselves is null (a reminder once they are passed)', () => {
    expect(wedgeWearReminder('W56', 60, 40, limits)).toBeNull();
  });

  it('wedgeWearReminder of a club other than a wedge is null', () => {
    expect(wedgeWearReminder('7I', 500, 500, limits)).toBeNull();
  });

  it('wedgeWearReminder’s default counts are the shop’s starting point', () => {
    expect(DEFAULT_WEDGE_WEAR_LIMITS).toEqual({ rounds: 75, practiceSessions: 100 });
  });
});
