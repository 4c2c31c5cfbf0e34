import type { ReactNode } from 'react';
import { View, type ViewProps } from 'react-native';

/** react-native-web writes `dataSet` as data-* attributes; the print stylesheet hides data-print="hide". */
const hidden = { dataSet: { print: 'hide' } } as unknown as ViewProps;

/** Children shown on screen, left out when the page is printed (buttons, links). */
export function NoPrint({ children, style }: { children: ReactNode; style?: ViewProps['style'] }) {
  return (
    <View {...hidden} style={style}>
      {children}
    </View>
  );
}
