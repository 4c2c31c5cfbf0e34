import { COURSE_STEPS, type CourseStep } from '@/server/schemas';

/** Steps something other than the staff's button reaches (the intake, the sent sheet, the acceptance). */
const REACHED_ELSEWHERE: ReadonlySet<CourseStep> = new Set(['intake-done', 'recommendation-sent', 'accepted']);

/**
 * The step the staff's "move on" button takes a fitting to, or null when the next step is
 * reached another way (the intake, sending the sheet, the player's acceptance) or it is
 * delivered. From "requested" the fitter may start without an intake. O(1).
 * @example nextStaffStep('accepted') // => 'built'
 * @example nextStaffStep('in-progress') // => null (send the spec sheet)
 */
export function nextStaffStep(step: CourseStep): CourseStep | null {
  if (step === 'requested') return 'in-progress';
  const next = COURSE_STEPS[COURSE_STEPS.indexOf(step) + 1];
  if (!next || REACHED_ELSEWHERE.has(next)) return null;
  return next;
}

/** The steps before this one (where a fitting may be sent back, with a reason). O(steps). */
export function earlierSteps(step: CourseStep): CourseStep[] {
  return COURSE_STEPS.slice(0, COURSE_STEPS.indexOf(step));
}

/** What the fitting waits for at a step, in words for the side reading it. */
export function waitingFor(step: CourseStep, staff: boolean): string {
  switch (step) {
    case 'requested':
      return staff ? 'Waiting for the player’s intake (or start without it).' : 'Answer the intake and send your files: your fitter starts from them.';
    case 'intake-done':
      return staff ? 'The intake is in: start the fitting.' : 'Your intake is in. Your fitter starts soon.';
    case 'in-progress':
      return staff ? 'Choose the builds and send the spec sheet.' : 'Your fitter is working on your recommendation.';
    case 'recommendation-sent':
      return staff ? 'Waiting for the player to accept the spec sheet.' : 'Read your spec sheet and accept it when you are happy.';
    case 'accepted':
      return staff ? 'Accepted: mark it built once the workshop is done.' : 'Accepted. The workshop builds your clubs next.';
    case 'built':
      return staff ? 'Built: mark it delivered when the player has the clubs.' : 'Your clubs are built.';
    case 'delivered':
      return staff ? 'Delivered.' : 'Delivered. Enjoy your clubs.';
  }
}
