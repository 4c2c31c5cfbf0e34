// Metro for the web build: Expo's defaults plus two changes (DEVELOPERS.md, "The web build").
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

// WOFF2 fonts (@fontsource/inter) are assets: exported under a content-hashed name.
config.resolver.assetExts = [...config.resolver.assetExts, 'woff2'];

// zod's error messages in some forty languages (about 270 KB of the web build) are bundled
// because zod re-exports them all; the app uses English only, so on the web the list of
// languages holds English alone. The server (Node) loads zod as it ships.
const zodLocalesWeb = path.resolve(__dirname, 'components/zod-locales-web.ts');
const resolveRequest = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (platform === 'web' && moduleName === '../locales/index.js' && /[\\/]node_modules[\\/]zod[\\/]v4[\\/]/.test(context.originModulePath)) {
    return { type: 'sourceFile', filePath: zodLocalesWeb };
  }
  return (resolveRequest ?? context.resolveRequest)(context, moduleName, platform);
};

module.exports = config;
