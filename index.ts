// The web app's entry: zod is told not to probe for `new Function` (the Content-Security-Policy
// forbids eval) before any schema is built, then Expo Router starts.
import './components/zod-jitless';
import 'expo-router/entry';
