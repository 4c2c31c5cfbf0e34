/**
 * The ovals' legend in the player's hand's words. The convention (common practice, no source):
 * seen from behind, a right-hander's in-to-out path and open face point right of the target line,
 * a left-hander's point left; a right-hander's draw curves left, a left-hander's right; where the
 * ball finishes is left or right on the ground for both hands.
 */
import { flightWords } from '@/components/analysis/flight-words';

const group = (clubPath: number, faceAngle: number, spinAxis: number, offline: number) =>
  ({ fields: { clubPath: { mean: clubPath }, faceAngle: { mean: faceAngle }, spinAxis: { mean: spinAxis }, offline: { mean: offline } } }) as never;

describe('flightWords', () => {
  it("a right-hander's swing and its mirror image, a left-hander's, read the same handed words and opposite misses", () => {
    expect(flightWords(group(3.5, 1.2, -6, -7), 'right')).toBe(' Path: in-to-out; face: open; curves: draw; finishes: miss left (right-handed words).');
    expect(flightWords(group(-3.5, -1.2, 6, 7), 'left')).toBe(' Path: in-to-out; face: open; curves: draw; finishes: miss right (left-handed words).');
  });

  it('the same stored numbers read the other way for the other hand', () => {
    expect(flightWords(group(3.5, 1.2, -6, -7), 'left')).toBe(' Path: out-to-in; face: closed; curves: fade; finishes: miss left (left-handed words).');
  });

  it('says nothing of the fields a build lacks', () => {
    expect(flightWords({ fields: { offline: { mean: 0.5 } } } as never, 'left')).toBe(' Finishes: on line (left-handed words).');
    expect(flightWords({ fields: {} } as never, 'right')).toBe('');
  });
});
