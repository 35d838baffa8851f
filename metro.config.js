// Metro (the web and native bundler) as Expo configures it, with one change: zod's locales resolve to English only.
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const zodLocales = path.join(__dirname, 'scripts', 'metro', 'zod-locales.js');
const zodInternals = `${path.sep}node_modules${path.sep}zod${path.sep}v4${path.sep}`;

config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === '../locales/index.js' && context.originModulePath.includes(zodInternals))
    return { type: 'sourceFile', filePath: zodLocales };
  return context.resolveRequest(context, moduleName, platform);
};

module.exports = config;
