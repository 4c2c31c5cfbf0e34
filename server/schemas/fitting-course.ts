import { z } from 'zod';
import { handednessSchema } from './players';
import { optionalText } from './common';

/** The steps of a fitting, in order. */
export const COURSE_STEPS = ['requested', 'intake-done', 'in-progress', 'recommendation-sent', 'accepted', 'built', 'delivered'] as const;
export const courseStepSchema = z.enum(COURSE_STEPS, { message: `A step is one of ${COURSE_STEPS.join(', ')}.` });
export type CourseStep = z.infer<typeof courseStepSchema>;

/** The words each step shows, for both sides. */
export const COURSE_STEP_WORDS: Readonly<Record<CourseStep, string>> = {
  requested: 'Requested',
  'intake-done': 'Intake done',
  'in-progress': 'In progress',
  'recommendation-sent': 'Recommendation sent',
  accepted: 'Accepted',
  built: 'Built',
  delivered: 'Delivered',
};

export const courseEntrySchema = z.object({
  id: z.number(),
  step: courseStepSchema,
  direction: z.enum(['forward', 'back']),
  reason: z.string().nullable(),
  at: z.string(),
  byName: z.string().nullable(),
});
export type CourseEntry = z.infer<typeof courseEntrySchema>;

export const courseSchema = z.object({ step: courseStepSchema, entries: z.array(courseEntrySchema) });
export type Course = z.infer<typeof courseSchema>;

/** POST /api/fittings/:id/course: the next step, or an earlier one with the reason. */
export const courseMoveSchema = z.object({
  to: courseStepSchema,
  reason: optionalText(500),
});
export type CourseMove = z.input<typeof courseMoveSchema>;

/** Plausible body measures, in cm. */
export const HEIGHT_CM = { min: 100, max: 230 } as const;
export const WRIST_TO_FLOOR_CM = { min: 50, max: 120 } as const;
/**
 * Wrist-to-floor as a share of height: about 0.485 in the standard segment proportions
 * (Drillis and Contini, "Body segment parameters", New York University report 1166-03, 1966;
 * from memory); a wide band around it refuses a typing slip, not an unusual body.
 */
export const WRIST_SHARE = { min: 0.35, max: 0.6 } as const;
/**
 * Handicap: a plus handicap down to +10 (written −10) up to 54.0, the largest Handicap Index the
 * World Handicap System allows (Rules of Handicapping, USGA and The R&A, 2020, Rule 5.2; from memory).
 */
export const HANDICAP = { min: -10, max: 54 } as const;

/** The player's intake before a remote fitting (heights in cm, canonical). */
export const intakeBodySchema = z
  .object({
    handedness: handednessSchema,
    heightCm: z
      .number({ message: 'Enter your height.' })
      .min(HEIGHT_CM.min, 'A height under 100 cm (3 ft 3 in) is not one we can fit for: check the number and the unit.')
      .max(HEIGHT_CM.max, 'A height over 230 cm (7 ft 6 in) is not likely: check the number and the unit.'),
    wristToFloorCm: z
      .number({ message: 'Enter your wrist-to-floor measure.' })
      .min(WRIST_TO_FLOOR_CM.min, 'Wrist-to-floor under 50 cm (19.7 in) is not likely: check the number and the unit.')
      .max(WRIST_TO_FLOOR_CM.max, 'Wrist-to-floor over 120 cm (47.2 in) is not likely: check the number and the unit.'),
    handicap: z.number().min(HANDICAP.min, 'A handicap is at best +10 (enter −10).').max(HANDICAP.max, 'A handicap is at most 54.').nullish().transform((v) => v ?? null),
    usualMiss: optionalText(200),
    ballFlightNow: optionalText(300),
    ballFlightWanted: optionalText(300),
    wishes: optionalText(2000),
  })
  .superRefine((v, ctx) => {
    if (v.wristToFloorCm >= v.heightCm) {
      ctx.addIssue({ code: 'custom', path: ['wristToFloorCm'], message: 'Wrist-to-floor must be shorter than your height.' });
    } else {
      const share = v.wristToFloorCm / v.heightCm;
      if (share < WRIST_SHARE.min || share > WRIST_SHARE.max) {
        ctx.addIssue({ code: 'custom', path: ['wristToFloorCm'], message: 'Wrist-to-floor is usually about half your height: check both numbers.' });
      }
    }
  });
export type IntakeBody = z.input<typeof intakeBodySchema>;

export const intakeSchema = z.object({
  fittingId: z.string(),
  handedness: handednessSchema,
  heightCm: z.number(),
  wristToFloorCm: z.number(),
  handicap: z.number().nullable(),
  usualMiss: z.string().nullable(),
  ballFlightNow: z.string().nullable(),
  ballFlightWanted: z.string().nullable(),
  wishes: z.string().nullable(),
  submittedAt: z.string(),
});
export type Intake = z.infer<typeof intakeSchema>;
/** GET /api/fittings/:id/intake: the answers, or null before the player has sent them. */
export type IntakeAnswer = { intake: Intake | null };

export const MESSAGE_MAX = 2000;
/** Control characters other than tab and line breaks (checked one character at a time). */
const hasControl = (text: string) => {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13) || c === 127) return true;
  }
  return false;
};

/** POST /api/fittings/:id/messages: plain text. */
export const messageBodySchema = z.object({
  body: z
    .string({ message: 'Write a message.' })
    .trim()
    .min(1, 'Write a message.')
    .max(MESSAGE_MAX, `A message holds at most ${MESSAGE_MAX} characters.`)
    .refine((t) => !hasControl(t), 'A message is plain text: remove the control characters.'),
});

export const messageSchema = z.object({
  id: z.number(),
  authorName: z.string(),
  fromPlayer: z.boolean(),
  mine: z.boolean(),
  body: z.string(),
  at: z.string(),
});
export type FittingMessage = z.infer<typeof messageSchema>;
export type MessageList = { messages: FittingMessage[]; unread: number };

/** POST /api/requests/:slug: the player's request for a remote fitting. */
export const fittingRequestBodySchema = z.object({ note: optionalText(1000) });
export const slugParamsSchema = z.object({ slug: z.string().trim().min(3).max(80).regex(/^[a-z0-9-]+$/, 'That link is not one of ours.') });
export type RequestPage = { shopName: string; slug: string };

/** One chosen build in a player's words (GET /api/fittings/:id/plain-words). */
export interface PlainChoice {
  club: string;
  clubLabel: string;
  buildLabel: string;
  /** "The 65 g shaft: 6 yd longer and as straight" */
  headline: string;
  /** "than the 55 g shaft" */
  against: string;
  certainty: 'settled' | 'not-yet';
  /** "About 7 in 10 of your next shots finish in a 33 yd fairway; …", or null without enough shots. */
  odds: string | null;
  /** How the ball curves and where it finishes, in the player's hand: "draw", "miss right". */
  curve: string | null;
  miss: string | null;
  shots: number;
}
export interface PlainWords {
  handedness: 'right' | 'left';
  choices: PlainChoice[];
}
