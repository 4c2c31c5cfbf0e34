import { useEffect, useRef } from 'react';
import { Animated, Easing, StyleSheet, View } from 'react-native';
import { colors, radius } from '../theme';

type ProgressBarProps = {
  /** 0..1, or null for work whose length is unknown (a sliding band). */
  fraction: number | null;
  label: string;
};

/** A thin bar: how much of a known amount is done, or a moving band while the amount is unknown. */
export function ProgressBar({ fraction, label }: ProgressBarProps) {
  const slide = useRef(new Animated.Value(0)).current;
  const indeterminate = fraction === null;
  useEffect(() => {
    if (!indeterminate) return;
    const loop = Animated.loop(Animated.timing(slide, { toValue: 1, duration: 1200, easing: Easing.inOut(Easing.ease), useNativeDriver: false }));
    loop.start();
    return () => loop.stop();
  }, [indeterminate, slide]);
  const pct = Math.round(Math.min(1, Math.max(0, fraction ?? 0)) * 100);
  return (
    <View
      style={styles.track}
      accessibilityRole="progressbar"
      accessibilityLabel={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={indeterminate ? undefined : pct}
    >
      {indeterminate ? (
        <Animated.View
          style={[
            styles.band,
            { left: slide.interpolate({ inputRange: [0, 1], outputRange: ['-35%', '100%'] }) as unknown as number },
          ]}
        />
      ) : (
        <View style={[styles.fill, { width: `${pct}%` }]} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  track: { height: 8, borderRadius: radius.pill, backgroundColor: colors.surfaceSunk, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: colors.accent, borderRadius: radius.pill },
  band: { position: 'absolute', top: 0, bottom: 0, width: '35%', backgroundColor: colors.accent, borderRadius: radius.pill },
});
