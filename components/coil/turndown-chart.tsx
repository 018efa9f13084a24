/**
 * Turndown chart: capacity and the lowest tube Reynolds number against the flow fraction (react-native-svg).
 * Two y axes: capacity on the left, Reynolds number on the right with the laminar (2300) and turbulent (4000)
 * bounds of ENGINEERING.md v1 decision 6 drawn as dashed lines.
 */
import { memo } from 'react';
import Svg, { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';
import { View } from 'react-native';
import { colors, fonts } from '@/components/ui/theme';
import { formatNumber, formatQuantity, unitLabel, type UnitSystem } from '@/lib/units';
import type { TurndownPoint } from '@/lib/engine/types';

const W = 340;
const H = 200;
const PAD = { l: 52, r: 52, t: 30, b: 36 };

export const TurndownChart = memo(function TurndownChart({ points, system }: { points: TurndownPoint[]; system: UnitSystem }) {
  const pts = points.filter((p) => p.capacity_W !== undefined).sort((a, b) => a.flowFraction - b.flowFraction);
  if (pts.length < 2) return null;
  const cap = pts.map((p) => formatQuantity('power', p.capacity_W!, system).value);
  const capMax = Math.max(...cap) * 1.1 || 1;
  const reMax = Math.max(4500, ...pts.map((p) => p.minReynolds)) * 1.1;
  const x = (f: number) => PAD.l + ((f - 0) / 1) * (W - PAD.l - PAD.r);
  const yCap = (v: number) => H - PAD.b - (v / capMax) * (H - PAD.t - PAD.b);
  const yRe = (v: number) => H - PAD.b - (v / reMax) * (H - PAD.t - PAD.b);
  const line = (ys: number[]) => pts.map((p, i) => `${i === 0 ? 'M' : 'L'}${x(p.flowFraction).toFixed(1)} ${ys[i].toFixed(1)}`).join('');
  const capColour = '#0072B2'; // Okabe-Ito blue
  const reColour = '#D55E00'; // Okabe-Ito vermillion
  const ticks = [0, 0.25, 0.5, 0.75, 1];
  const font = { fontFamily: fonts.mono, fontSize: 10 };
  return (
    <View accessibilityLabel="Turndown: capacity and lowest Reynolds number against flow fraction" testID="turndown-chart">
      <Svg width="100%" height={H} viewBox={`0 0 ${W} ${H}`}>
        <Line x1={PAD.l} y1={H - PAD.b} x2={W - PAD.r} y2={H - PAD.b} stroke={colors.borderStrong} />
        <Line x1={PAD.l} y1={PAD.t} x2={PAD.l} y2={H - PAD.b} stroke={capColour} />
        <Line x1={W - PAD.r} y1={PAD.t} x2={W - PAD.r} y2={H - PAD.b} stroke={reColour} />
        {ticks.map((f) => (
          <SvgText key={f} x={x(f)} y={H - PAD.b + 13} textAnchor="middle" fill={colors.textMuted} {...font}>
            {`${Math.round(f * 100)}%`}
          </SvgText>
        ))}
        <SvgText x={(PAD.l + W - PAD.r) / 2} y={H - 4} textAnchor="middle" fill={colors.text} {...font}>
          flow, share of design
        </SvgText>
        {[0, 0.5, 1].map((k) => (
          <G key={k}>
            <SvgText x={PAD.l - 4} y={yCap(capMax * k) + 3} textAnchor="end" fill={capColour} {...font}>
              {formatNumber(capMax * k, capMax * k >= 100 ? 0 : 1)}
            </SvgText>
            <SvgText x={W - PAD.r + 4} y={yRe(reMax * k) + 3} textAnchor="start" fill={reColour} {...font}>
              {formatNumber(reMax * k, 0)}
            </SvgText>
          </G>
        ))}
        <SvgText x={PAD.l} y={PAD.t - 16} textAnchor="middle" fill={capColour} {...font}>
          {unitLabel('power', system)}
        </SvgText>
        <SvgText x={W - PAD.r} y={PAD.t - 16} textAnchor="middle" fill={reColour} {...font}>
          Re min
        </SvgText>
        {[2300, 4000].map((re) => (
          <Line key={re} x1={PAD.l} x2={W - PAD.r} y1={yRe(re)} y2={yRe(re)} stroke={reColour} strokeDasharray="3 3" opacity={0.5} />
        ))}
        <Path d={line(cap.map(yCap))} stroke={capColour} strokeWidth={2} fill="none" />
        <Path d={line(pts.map((p) => yRe(p.minReynolds)))} stroke={reColour} strokeWidth={2} fill="none" strokeDasharray="6 3" />
        {pts.map((p, i) => (
          <G key={p.flowFraction}>
            <Circle cx={x(p.flowFraction)} cy={yCap(cap[i])} r={2.5} fill={capColour} />
            <Circle cx={x(p.flowFraction)} cy={yRe(p.minReynolds)} r={2.5} fill={reColour} />
          </G>
        ))}
      </Svg>
    </View>
  );
});
