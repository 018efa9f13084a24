/**
 * Tubeloom's mark: a copper tube weaving through three tube holes, with the wordmark beside it.
 */
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';
import { colors, fonts, palette, space } from '@/components/ui/theme';

export function BrandMark({ size = 28 }: { size?: number }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" accessibilityElementsHidden importantForAccessibility="no">
      <Circle cx={8} cy={8} r={4.2} fill={palette.teal500} />
      <Circle cx={24} cy={16} r={4.2} fill={palette.teal500} />
      <Circle cx={8} cy={24} r={4.2} fill={palette.teal500} />
      <Path
        d="M8 8 C 20 8, 28 10, 24 16 C 20 22, 4 18, 8 24"
        stroke={palette.copper500}
        strokeWidth={3}
        strokeLinecap="round"
        fill="none"
      />
    </Svg>
  );
}

export function Brand({ onDark = true, size = 'md' }: { onDark?: boolean; size?: 'md' | 'lg' }) {
  const big = size === 'lg';
  return (
    <View style={styles.row} accessibilityLabel="Tubeloom" role="img">
      <BrandMark size={big ? 40 : 28} />
      <Text
        style={[
          styles.word,
          { fontSize: big ? 28 : 20, lineHeight: big ? 34 : 26, color: onDark ? colors.textOnDark : colors.chrome },
        ]}
      >
        tube<Text style={{ color: onDark ? palette.copper500 : colors.accent }}>loom</Text>
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  word: { fontFamily: fonts.sansSemiBold, letterSpacing: 0.2 },
});
