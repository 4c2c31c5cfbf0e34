import { markerPath } from '@/components/charts/marker-path';

describe('markerPath', () => {
  it('markerPath of every shape is a closed path centred on the point', () => {
    for (const shape of ['circle', 'square', 'diamond', 'triangle'] as const) {
      const path = markerPath(shape, 50, 80, 4);
      expect(path.startsWith('M')).toBe(true);
      expect(path.endsWith('Z')).toBe(true);
    }
    // equal area to the circle: side r·√π (square), half-diagonal r·√(π/2) (diamond)
    expect(markerPath('square', 10, 10, 4)).toBe('M6.46,6.46H13.54V13.54H6.46Z');
  });
});
