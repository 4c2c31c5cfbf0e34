import { earlierSteps, nextStaffStep } from '@/components/remote/course-moves';

describe('nextStaffStep', () => {
  it('nextStaffStep, each step, gives the staff button only the steps staff take', () => {
    expect(nextStaffStep('requested')).toBe('in-progress');
    expect(nextStaffStep('intake-done')).toBe('in-progress');
    expect(nextStaffStep('in-progress')).toBeNull(); // sending the sheet moves it
    expect(nextStaffStep('recommendation-sent')).toBeNull(); // the player accepts
    expect(nextStaffStep('accepted')).toBe('built');
    expect(nextStaffStep('built')).toBe('delivered');
    expect(nextStaffStep('delivered')).toBeNull();
  });
});

describe('earlierSteps', () => {
  it('earlierSteps, "in progress", lists the two before it in order; "requested" none', () => {
    expect(earlierSteps('in-progress')).toEqual(['requested', 'intake-done']);
    expect(earlierSteps('requested')).toEqual([]);
  });
});
