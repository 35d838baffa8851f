import { describe, expect, it } from 'vitest';
import { decideBrowser, isDebianLike, type BrowserProbe } from '@/scripts/find-browser';

const DEBIAN = 'PRETTY_NAME="Debian GNU/Linux 12 (bookworm)"\nID=debian\nVERSION_ID="12"\n';
const UBUNTU = 'NAME="Ubuntu"\nID=ubuntu\nID_LIKE=debian\n';
const MINT = 'NAME="Linux Mint"\nID=linuxmint\nID_LIKE="ubuntu debian"\n';
const FEDORA = 'NAME="Fedora Linux"\nID=fedora\n';

/** A machine with only the given files, as root on Debian unless told otherwise. */
function machine(files: string[], overrides: Partial<BrowserProbe> = {}): BrowserProbe {
  return {
    env: { PATH: '/usr/local/bin:/usr/bin:/bin', HOME: '/home/traveller' },
    platform: 'linux',
    isRoot: true,
    osRelease: DEBIAN,
    exists: (file) => files.includes(file),
    ...overrides,
  };
}

describe('decideBrowser', () => {
  it('when CHROME_PATH names a file, then that browser is used even if Debian Chromium is there too', () => {
    const probe = machine(['/opt/chrome/chrome', '/usr/bin/chromium'], { env: { CHROME_PATH: '/opt/chrome/chrome' } });
    expect(decideBrowser(probe)).toEqual({ kind: 'found', path: '/opt/chrome/chrome' });
  });

  it('when CHROME_PATH names a missing file, then it says so and installs nothing', () => {
    const decision = decideBrowser(machine(['/usr/bin/chromium'], { env: { CHROME_PATH: '/nowhere/chrome' } }));
    expect(decision.kind).toBe('missing');
    expect(decision.kind === 'missing' && decision.message).toContain('CHROME_PATH is /nowhere/chrome');
  });

  it.each([
    ['/usr/bin/chromium'],
    ['/usr/bin/chromium-browser'],
    ['/usr/local/bin/google-chrome'],
    ['/usr/bin/google-chrome-stable'],
    ['/snap/bin/chromium'],
  ])('when only %s exists on Linux, then it is found', (file) => {
    expect(decideBrowser(machine([file]))).toEqual({ kind: 'found', path: file });
  });

  it('when Chromium and Chrome are both there, then Chromium comes first', () => {
    const decision = decideBrowser(machine(['/usr/bin/google-chrome', '/usr/bin/chromium']));
    expect(decision).toEqual({ kind: 'found', path: '/usr/bin/chromium' });
  });

  it.each([
    ['/Applications/Google Chrome.app/Contents/MacOS/Google Chrome'],
    ['/Applications/Chromium.app/Contents/MacOS/Chromium'],
    ['/home/traveller/Applications/Chromium.app/Contents/MacOS/Chromium'],
  ])('when %s exists on macOS, then it is found', (file) => {
    expect(decideBrowser(machine([file], { platform: 'darwin' }))).toEqual({ kind: 'found', path: file });
  });

  it.each([
    ['Debian', DEBIAN],
    ['Ubuntu', UBUNTU],
  ])('when none is found and root runs on %s, then Debian’s chromium is installed with apt-get', (_name, osRelease) => {
    const decision = decideBrowser(machine([], { osRelease }));
    expect(decision.kind).toBe('install');
    if (decision.kind !== 'install') return;
    expect(decision.commands.at(-1)).toEqual(['apt-get', 'install', '-y', '-qq', 'chromium']);
    expect(decision.announcement).toMatch(/installing Debian's chromium package with apt-get/);
  });

  it.each([
    ['not root', { isRoot: false }],
    ['on Fedora', { osRelease: FEDORA }],
    ['without /etc/os-release', { osRelease: undefined }],
    ['on macOS', { platform: 'darwin' as const }],
  ])('when none is found and it runs %s, then it keeps the advice and installs nothing', (_name, overrides) => {
    const decision = decideBrowser(machine([], overrides));
    expect(decision.kind).toBe('missing');
    expect(decision.kind === 'missing' && decision.message).toContain('sudo apt-get install -y chromium');
  });

  it('when an install was already tried, then a second look never asks to install again', () => {
    expect(decideBrowser(machine([]), false).kind).toBe('missing');
  });
});

describe('isDebianLike', () => {
  it.each([
    [DEBIAN, true],
    [UBUNTU, true],
    [MINT, true],
    [FEDORA, false],
    ['', false],
  ])('when os-release is %j, then Debian-like is %s', (text, expected) => {
    expect(isDebianLike(text)).toBe(expected);
  });
});
