// Metro (the web and native bundler) as Expo configures it, with two changes: zod's locales resolve to English only,
// and Skia's web loader gets CanvasKit's standard build instead of the full one (scripts/metro/canvaskit-build.js).
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');
const canvasKit = require('./scripts/metro/canvaskit-build');

const config = getDefaultConfig(__dirname);
const zodLocales = path.join(__dirname, 'scripts', 'metro', 'zod-locales.js');
const zodInternals = `${path.sep}node_modules${path.sep}zod${path.sep}v4${path.sep}`;

config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === '../locales/index.js' && context.originModulePath.includes(zodInternals))
    return { type: 'sourceFile', filePath: zodLocales };
  if (moduleName === canvasKit.SKIA_LOADER_IMPORT) return context.resolveRequest(context, canvasKit.LOADER, platform);
  return context.resolveRequest(context, moduleName, platform);
};

module.exports = config;
