import Svg, { Circle, Ellipse, Rect } from 'react-native-svg';
import { colors } from '../theme';

type BrandMarkProps = { size?: number };

/** Ovalyard's mark: a tilted copper oval around a ball, on green-slate. */
export function BrandMark({ size = 40 }: BrandMarkProps) {
  return (
    <Svg width={size} height={size} viewBox="0 0 64 64" accessibilityLabel="Ovalyard">
      <Rect x={0} y={0} width={64} height={64} rx={14} fill={colors.ink} />
      <Ellipse cx={32} cy={33} rx={22} ry={12} transform="rotate(-24 32 33)" stroke={colors.accent} strokeWidth={5} fill="none" />
      <Circle cx={32} cy={33} r={6} fill={colors.paper} />
    </Svg>
  );
}
