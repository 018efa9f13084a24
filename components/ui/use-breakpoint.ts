/** Phone-first layout switch: `isWide` at and above WIDE_BREAKPOINT (1024 px), where the shell shows a sidebar. */
import { useWindowDimensions } from 'react-native';
import { WIDE_BREAKPOINT } from '@/components/ui/theme';

export interface Breakpoint {
  width: number;
  height: number;
  isWide: boolean;
}

export function useBreakpoint(): Breakpoint {
  const { width, height } = useWindowDimensions();
  return { width, height, isWide: width >= WIDE_BREAKPOINT };
}
