// Who was signed in on this device, so the app still opens with no signal (the session check cannot reach the
// server then). Only a flag is kept: the server still checks the real session on every request once back online.
const KEY = 'trailtally-signed-in';

const storage = (): Storage | null => (typeof localStorage === 'undefined' ? null : localStorage);

export function rememberSignedIn(signedIn: boolean): void {
  const s = storage();
  if (!s) return;
  if (signedIn) s.setItem(KEY, '1');
  else s.removeItem(KEY);
}

export function wasSignedIn(): boolean {
  return storage()?.getItem(KEY) === '1';
}
