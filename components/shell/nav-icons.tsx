/** Small line icons for the navigation (drawn here, no icon font). */
import Svg, { Circle, Path, Rect } from 'react-native-svg';

export type NavIconName = 'projects' | 'team' | 'settings' | 'outbox';

export function NavIcon({ name, color, size = 22 }: { name: NavIconName; color: string; size?: number }) {
  const common = { stroke: color, strokeWidth: 1.8, fill: 'none', strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'projects' ? (
        <>
          <Path d="M3 7 h6 l2 2 h10 v10 H3 Z" {...common} />
          <Path d="M7 14 h10" {...common} />
        </>
      ) : null}
      {name === 'team' ? (
        <>
          <Circle cx={9} cy={9} r={3.2} {...common} />
          <Circle cx={17} cy={10} r={2.5} {...common} />
          <Path d="M3.5 19 c0.8 -3.5 3 -5 5.5 -5 s4.7 1.5 5.5 5" {...common} />
          <Path d="M15 14.5 c2.4 -0.3 4.6 0.9 5.5 4" {...common} />
        </>
      ) : null}
      {name === 'settings' ? (
        <>
          <Path d="M4 7 h16 M4 12 h16 M4 17 h16" {...common} />
          <Circle cx={9} cy={7} r={1.8} {...common} fill={color} />
          <Circle cx={15} cy={12} r={1.8} {...common} fill={color} />
          <Circle cx={7} cy={17} r={1.8} {...common} fill={color} />
        </>
      ) : null}
      {name === 'outbox' ? (
        <>
          <Rect x={3} y={6} width={18} height={13} rx={2} {...common} />
          <Path d="M3.5 7 l8.5 6.5 l8.5 -6.5" {...common} />
        </>
      ) : null}
    </Svg>
  );
}
