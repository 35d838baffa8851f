// The client's only configuration. Empty means "same origin", which is how `npm start` serves the
// app; `npm run dev` sets EXPO_PUBLIC_API_URL because the Expo dev server runs on another port.
export const API_BASE_URL: string = process.env.EXPO_PUBLIC_API_URL ?? '';
