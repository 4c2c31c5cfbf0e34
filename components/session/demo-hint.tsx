import { StyleSheet, View } from 'react-native';
import { AppText } from '../ui/app-text';
import { colors, space } from '../theme';

/**
 * Demo data: the invented demo shop's sign-ins (fixtures/demo/scenario.json). Shown, and the form
 * pre-filled with the fitter's, only when the server says the demo is loaded (GET /api/demo).
 */
export const DEMO_HINT =
  'Demo: oskar@larchmere.example / ovalyard-demo (fitter), hedda@larchmere.example (owner), nell.tarrant@example.net (player)';

/** The demo fitter's sign-in, pre-filled into the form of a demo. */
export const DEMO_SIGN_IN = { email: 'oskar@larchmere.example', password: 'ovalyard-demo' } as const;

/** The demo sign-ins, under the sign-in form. */
export function DemoHint() {
  return (
    <View style={styles.box}>
      <AppText variant="caption" tone="muted" selectable>
        {DEMO_HINT}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderTopWidth: 1, borderTopColor: colors.border, paddingTop: space.md },
});
