// zod's list of locales, cut to the one the app uses: the full list (every language's messages) is about 280 kB of
// the web app's first download, and the app only ever shows English messages (set by zod itself on load).
export { default as en } from 'zod/v4/locales/en.js';
