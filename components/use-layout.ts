import { useWindowDimensions } from 'react-native';
import { breakpoints } from './theme';

/** One answer to "phone or wide screen?" for every layout decision. */
export function useIsWide(): boolean {
  const { width } = useWindowDimensions();
  return width >= breakpoints.wide;
}
