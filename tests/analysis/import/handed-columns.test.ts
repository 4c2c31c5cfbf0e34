/**
 * Files that write club path, face angle and face to path for the player's hand. The convention
 * checked here is the trade's (common practice, no source): seen from behind the golfer, a
 * right-hander's in-to-out path points right of the target line and a left-hander's points left;
 * a right-hander's open face points right, a left-hander's left; the ball's curve (spin axis),
 * where it starts (launch direction) and where it ends (offline) are left and right on the
 * ground for both hands. Ovalyard stores every left/right value with + = right.
 *
 * The session below is a right-hander's and its mirror image, a left-hander's: the same swing
 * seen in a mirror. A device that writes path and face for the player's hand writes the same
 * path and face numbers for both, and mirrored numbers for the ground values. Imported with the
 * player's hand, both must give the mirrored shot in storage, the same handed words, and
 * unchanged speeds, spins and distances.
 */
import { SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import { importBayFile, type Recipe } from '@/analysis/import';
import { curveWord, faceWord, missWord, pathWord } from '@/analysis/plain-words/handed-words';

// Invented shots: [ball mph, launch°, spin rpm, carry yd, launch direction°, spin axis°, offline yd, path°, face°, face to path°]
const RIGHT_HANDER: readonly (readonly number[])[] = [
  [132.4, 15.1, 5210, 182.0, -1.8, -6.2, -7.5, 4.1, 1.2, -2.9],
  [129.8, 16.0, 5480, 176.5, -2.4, -8.0, -11.2, 3.6, 0.4, -3.2],
  [131.1, 14.6, 5105, 180.2, 1.1, 3.4, 6.3, -2.8, 2.2, 5.0],
];

const HEADER = 'Club,Ball Speed (mph),Launch Angle (deg),Spin Rate (rpm),Carry (yds),Launch Direction (deg),Spin Axis (deg),Offline (yds),Club Path (deg),Face Angle (deg),Face to Path (deg)';

/** The file a device writes: ground values as they fall (+ right), path and face as given. */
function file(rows: readonly (readonly number[])[]): string {
  return [HEADER, ...rows.map((r) => `6 Iron,${r.join(',')}`)].join('\n') + '\n';
}

/** The same swing seen in a mirror: every ground left/right value changes sign, path and face (written for the hand) do not. */
const LEFT_HANDER = RIGHT_HANDER.map((r) => [r[0], r[1], r[2], r[3], -r[4], -r[5], -r[6], r[7], r[8], r[9]]);

const handedRecipe: Recipe = {
  columns: {
    'Club Path (deg)': { field: 'clubPath', unit: 'deg', side: 'signed-right-positive', handed: true },
    'Face Angle (deg)': { field: 'faceAngle', unit: 'deg', side: 'signed-right-positive', handed: true },
    'Face to Path (deg)': { field: 'faceToPath', unit: 'deg', handed: true },
  },
};

const MIRRORED: readonly ShotField[] = [...SIDE_FIELDS, 'faceToPath'];

describe('columns written for the player\'s hand', () => {
  const right = importBayFile(file(RIGHT_HANDER), { recipe: handedRecipe, hand: 'right' }).shots;
  const left = importBayFile(file(LEFT_HANDER), { recipe: handedRecipe, hand: 'left' }).shots;

  it('imports every shot of both files', () => {
    expect(right).toHaveLength(3);
    expect(left).toHaveLength(3);
  });

  it('stores the left-hander\'s shot as the mirror image of the right-hander\'s: every left/right value turned round', () => {
    for (let i = 0; i < right.length; i++) {
      for (const field of MIRRORED) {
        const r = right[i].values[field];
        if (r === undefined) continue;
        expect(left[i].values[field]).toBeCloseTo(-r, 9);
      }
    }
    // the file's own numbers: 4.1° in-to-out for the left-hander is 4.1° left of the target line
    expect(left[0].values.clubPath).toBeCloseTo(-4.1, 9);
    expect(left[0].values.faceAngle).toBeCloseTo(-1.2, 9);
    expect(left[0].values.offline).toBeCloseTo(7.5 * 0.9144, 9); // NIST SP 811: 1 yd = 0.9144 m
  });

  it('keeps speeds, launch, spin and carry the same for both hands', () => {
    for (let i = 0; i < right.length; i++) {
      for (const field of ['ballSpeed', 'launchAngle', 'spinRate', 'carry'] as const) {
        expect(left[i].values[field]).toBe(right[i].values[field]);
      }
    }
  });

  it('gives the mirrored session the same handed words and the opposite miss', () => {
    for (let i = 0; i < right.length; i++) {
      const r = right[i].values;
      const l = left[i].values;
      expect(pathWord(l.clubPath!, 'left')).toBe(pathWord(r.clubPath!, 'right'));
      expect(faceWord(l.faceAngle!, 'left')).toBe(faceWord(r.faceAngle!, 'right'));
      expect(curveWord(l.spinAxis!, 'left')).toBe(curveWord(r.spinAxis!, 'right'));
      const rightMiss = missWord(r.offline!);
      const leftMiss = missWord(l.offline!);
      expect(leftMiss).toBe(rightMiss === 'miss left' ? 'miss right' : rightMiss === 'miss right' ? 'miss left' : 'on line');
    }
    // the first shot: path 4.1° in-to-out, face 1.2° open to the target and closed to the path
    expect(pathWord(left[0].values.clubPath!, 'left')).toBe('in-to-out');
    expect(curveWord(left[0].values.spinAxis!, 'left')).toBe('draw');
  });

  it('keeps face to path equal to face angle minus club path after the turn (the D-plane relation)', () => {
    for (const s of left) expect(s.values.faceToPath!).toBeCloseTo(s.values.faceAngle! - s.values.clubPath!, 9);
  });

  it('leaves a right-handed player\'s handed columns as written', () => {
    expect(right[0].values.clubPath).toBeCloseTo(4.1, 9);
    expect(right[0].values.faceToPath).toBeCloseTo(-2.9, 9);
  });

  it('turns nothing round for a left-hander when the columns are not marked as written for the hand', () => {
    const plain = importBayFile(file(LEFT_HANDER), { hand: 'left' }).shots;
    expect(plain[0].values.clubPath).toBeCloseTo(4.1, 9);
    expect(plain[0].values.offline).toBeCloseTo(7.5 * 0.9144, 9);
  });

  it('keeps the mark in the recipe it answers, so a saved recipe turns the next file round too', () => {
    const result = importBayFile(file(LEFT_HANDER), { recipe: handedRecipe, hand: 'left' });
    expect(result.recipe.columns['Club Path (deg)']).toMatchObject({ field: 'clubPath', handed: true });
    expect(result.recipe.columns['Offline (yds)'].handed).toBeUndefined();
  });
});
