import { useCallback, useState } from 'react';
import type { LayoutChangeEvent } from 'react-native';

/** The measured width of a view (for charts that size themselves); 0 until laid out. */
export function useWidth(initial = 0): [number, (e: LayoutChangeEvent) => void] {
  const [width, setWidth] = useState(initial);
  const onLayout = useCallback((e: LayoutChangeEvent) => {
    const w = Math.floor(e.nativeEvent.layout.width);
    setWidth((old) => (Math.abs(old - w) >= 1 ? w : old));
  }, []);
  return [width, onLayout];
}
