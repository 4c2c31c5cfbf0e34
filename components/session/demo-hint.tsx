import { StyleSheet, View } from 'react-native';
import { AppText } from '../ui/app-text';
import { colors, space } from '../theme';

/**
 * Demo data: the invented demo shop's sign-ins (fixtures/demo/scenario.json). Shown, and the form
 * pre-filled with the fitter's, only when the server says the demo is loaded (GET /api/demo).
 */
export const DEMO_PASSWORD = 'ovalyard-demo';
export const DEMO_SIGN_INS = [
  { role: 'Fitter', email: 'oskar@larchmere.example' },
  { role: 'Owner', email: 'hedda@larchmere.example' },
  { role: 'Player', email: 'nell.tarrant@example.net' },
] as const;

/** The demo fitter's sign-in, pre-filled into the form of a demo. */
export const DEMO_SIGN_IN = { email: DEMO_SIGN_INS[0].email, password: DEMO_PASSWORD } as const;

/** The demo sign-ins, under the sign-in form: one line each, so no address breaks. */
export function DemoHint() {
  return (
    <View style={styles.box}>
      <AppText variant="caption" tone="muted">{`Demo sign-ins, password ${DEMO_PASSWORD} for all:`}</AppText>
      {DEMO_SIGN_INS.map((s) => (
        <View key={s.email} style={styles.line}>
          <AppText variant="caption" tone="muted" style={styles.role}>
            {s.role}
          </AppText>
          <AppText variant="caption" selectable style={styles.email}>
            {s.email}
          </AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderTopWidth: 1, borderTopColor: colors.border, paddingTop: space.md, gap: 2 },
  line: { flexDirection: 'row', gap: space.sm },
  role: { width: 48 },
  email: { flexShrink: 1 },
});
