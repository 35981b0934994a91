// The app's entry. `@expo/metro-runtime` first, as in Expo Router's own entry: it installs the loader that
// fetches chunks. Then the route files of the address being opened are asked for (web only), then Expo
// Router starts as its own entry would.
import '@expo/metro-runtime';
import './components/routing/preload-route';
import 'expo-router/entry';
