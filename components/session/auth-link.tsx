import { Link, type Href } from 'expo-router';
import { StyleSheet } from 'react-native';
import { AppText } from '../ui/app-text';
import { layout } from '../theme';

type AuthLinkProps = {
  href: Href;
  children: string;
  /** Centred under a form (the default), or at the start of a line inside a notice. */
  align?: 'center' | 'start';
};

/** A quiet text link between the signed-out screens, 44 px tall to tap. */
export function AuthLink({ href, children, align = 'center' }: AuthLinkProps) {
  return (
    <Link href={href} style={[styles.link, align === 'start' && styles.start]}>
      <AppText variant="bodyStrong" tone="accent">
        {children}
      </AppText>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { minHeight: layout.minTouchPx, alignSelf: 'center', justifyContent: 'center', paddingVertical: 11 },
  start: { alignSelf: 'flex-start' },
});
