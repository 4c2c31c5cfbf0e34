import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, layout, space } from '../theme';
import { AppText } from './app-text';
import { HeaderBackButton } from './header-back-button';

type AppHeaderProps = {
  title: string;
  /** The way back: to the previous page, to the start page (a page opened by its address), or none (a tab). */
  back: { label: string; onPress: () => void } | null;
};

/** Room the back control takes beside the content column (its width and a small gap). */
const BACK_PX = layout.minTouchPx + space.xs;

/**
 * The one header of the signed-in app (stack pages, tabs, the not-found page): the title starts
 * where the page's centred content starts. On a wide window the back control hangs in the margin
 * left of the column, so the title lines up with the content below; on a narrow one it sits
 * before the title. The back control is the same chevron everywhere.
 */
export function AppHeader({ title, back }: AppHeaderProps) {
  const { width } = useWindowDimensions();
  const insets = useSafeAreaInsets();
  const columnPx = Math.min(width, layout.maxContentWidthPx);
  const hangs = (width - columnPx) / 2 >= BACK_PX;
  return (
    <View style={[styles.bar, { paddingTop: insets.top }]}>
      <View style={styles.column}>
        {back ? (
          <View style={hangs ? styles.backHanging : styles.backInline}>
            <HeaderBackButton label={back.label} onPress={back.onPress} />
          </View>
        ) : null}
        <AppText variant="heading" tone="onInk" accessibilityRole="header" numberOfLines={1} style={styles.title}>
          {title}
        </AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { backgroundColor: colors.ink },
  column: {
    width: '100%',
    maxWidth: layout.maxContentWidthPx,
    alignSelf: 'center',
    minHeight: 56,
    paddingHorizontal: space.lg,
    flexDirection: 'row',
    alignItems: 'center',
  },
  // The chevron's glyph is inset in its 44 px target; pull the target left so the glyph sits near the edge.
  backInline: { marginLeft: -space.md, marginRight: space.xs },
  backHanging: { position: 'absolute', left: space.lg - BACK_PX, top: 0, bottom: 0, justifyContent: 'center' },
  title: { flexShrink: 1 },
});
