import type { ColorValue } from 'react-native';
import Svg, { Circle, Ellipse, Path, Rect } from 'react-native-svg';

export type TabIconName = 'players' | 'fittings' | 'team' | 'account' | 'bag';

type TabIconProps = { name: TabIconName; color: ColorValue; size?: number };

/** The tab bar's line icons, drawn for Ovalyard (24-unit grid, 1.8 stroke). */
export function TabIcon({ name, color, size = 24 }: TabIconProps) {
  const stroke = { stroke: color, strokeWidth: 1.8, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' } as const;
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'players' ? (
        <>
          <Circle cx={9} cy={8} r={3.2} {...stroke} />
          <Path d="M3.5 19c.6-3.2 2.8-5 5.5-5s4.9 1.8 5.5 5" {...stroke} />
          <Circle cx={17} cy={9} r={2.4} {...stroke} />
          <Path d="M16 14.2c2.3-.2 4 1.3 4.6 4" {...stroke} />
        </>
      ) : null}
      {name === 'fittings' ? (
        <>
          <Ellipse cx={12} cy={13} rx={8} ry={5} transform="rotate(-18 12 13)" {...stroke} />
          <Circle cx={12} cy={13} r={1.4} fill={color} />
          <Path d="M12 3v4" {...stroke} />
        </>
      ) : null}
      {name === 'team' ? (
        <>
          <Rect x={4} y={5} width={16} height={14} rx={2.5} {...stroke} />
          <Path d="M8 10h8M8 14h5" {...stroke} />
        </>
      ) : null}
      {name === 'bag' ? (
        <>
          <Rect x={7} y={7} width={10} height={14} rx={3} {...stroke} />
          <Path d="M9 7V4.5M12 7V3M15 7V5" {...stroke} />
          <Path d="M7 12h10" {...stroke} />
        </>
      ) : null}
      {name === 'account' ? (
        <>
          <Circle cx={12} cy={12} r={8.5} {...stroke} />
          <Circle cx={12} cy={10} r={2.8} {...stroke} />
          <Path d="M6.8 18c1.1-2 3-3 5.2-3s4.1 1 5.2 3" {...stroke} />
        </>
      ) : null}
    </Svg>
  );
}
