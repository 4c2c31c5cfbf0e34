import { StyleSheet, View } from 'react-native';
import { AppText } from '../ui/app-text';
import { space } from '../theme';
import { AuthLink } from './auth-link';

/** The reset page opened without a token: the link was cut short (a wrapped line in the e-mail). */
export function ResetLinkIncomplete() {
  return (
    <View style={styles.box}>
      <AppText variant="heading" accessibilityRole="header">
        This link is incomplete
      </AppText>
      <AppText>
        The address is missing the part that identifies your request. Open the link from the e-mail again, or ask for a new one.
      </AppText>
      <AuthLink href="/forgot">Ask for a new link</AuthLink>
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.lg } });
