import fs from 'node:fs';
import path from 'node:path';

/** What the browser finder looks at, passed in so its decisions can be tested without the machine. */
export type BrowserProbe = {
  env: { CHROME_PATH?: string; PATH?: string; HOME?: string };
  platform: NodeJS.Platform;
  isRoot: boolean;
  /** The text of /etc/os-release, when there is one. */
  osRelease?: string;
  exists: (file: string) => boolean;
};

export type BrowserDecision =
  | { kind: 'found'; path: string }
  | { kind: 'install'; announcement: string; commands: string[][] }
  | { kind: 'missing'; message: string };

// Chromium-family browsers by the names their packages give them, most likely first.
const LINUX_NAMES = ['chromium', 'chromium-browser', 'google-chrome', 'google-chrome-stable'];
const MAC_APPS = ['Google Chrome.app/Contents/MacOS/Google Chrome', 'Chromium.app/Contents/MacOS/Chromium'];

const INSTALL_ADVICE =
  'Install it with:  sudo apt-get update && sudo apt-get install -y chromium\n' +
  'or point CHROME_PATH at another Chromium or Chrome binary.';

function candidates(probe: BrowserProbe): string[] {
  if (probe.platform === 'darwin') {
    const roots = ['/Applications', ...(probe.env.HOME ? [path.posix.join(probe.env.HOME, 'Applications')] : [])];
    return roots.flatMap((root) => MAC_APPS.map((app) => path.posix.join(root, app)));
  }
  const dirs = [...(probe.env.PATH ?? '').split(':').filter(Boolean), '/usr/bin', '/snap/bin'];
  const unique = [...new Set(dirs)];
  return LINUX_NAMES.flatMap((name) => unique.map((dir) => path.posix.join(dir, name)));
}

/** Debian, Ubuntu, or a distribution that says it is like one of them (and so has apt-get and a chromium package). */
export function isDebianLike(osRelease: string | undefined): boolean {
  if (!osRelease) return false;
  const field = (name: string) =>
    new RegExp(`^${name}=["']?([^"'\\n]*)`, 'm').exec(osRelease)?.[1]?.toLowerCase().split(/\s+/) ?? [];
  return [...field('ID'), ...field('ID_LIKE')].some((id) => id === 'debian' || id === 'ubuntu');
}

/**
 * Where the browser tests' Chromium is: CHROME_PATH when set (and then only there), else the usual places.
 * With none found, root on Debian or Ubuntu may install Debian's `chromium` package; anyone else gets advice.
 */
export function decideBrowser(probe: BrowserProbe, allowInstall = true): BrowserDecision {
  const configured = probe.env.CHROME_PATH;
  if (configured) {
    return probe.exists(configured)
      ? { kind: 'found', path: configured }
      : { kind: 'missing', message: `CHROME_PATH is ${configured}, which does not exist.\n${INSTALL_ADVICE}` };
  }
  const found = candidates(probe).find((file) => probe.exists(file));
  if (found) return { kind: 'found', path: found };
  if (allowInstall && probe.platform === 'linux' && probe.isRoot && isDebianLike(probe.osRelease)) {
    return {
      kind: 'install',
      announcement: "No Chromium found for the browser tests: installing Debian's chromium package with apt-get…",
      commands: [
        ['apt-get', 'update', '-qq'],
        ['apt-get', 'install', '-y', '-qq', 'chromium'],
      ],
    };
  }
  return {
    kind: 'missing',
    message: `Browser tests need Chromium or Chrome, and none was found (looked for ${LINUX_NAMES.join(', ')}${
      probe.platform === 'darwin' ? ' and the Chrome and Chromium applications' : ''
    }).\n${INSTALL_ADVICE}`,
  };
}

/** This machine, as the finder sees it. */
export function probeMachine(): BrowserProbe {
  let osRelease: string | undefined;
  try {
    osRelease = fs.readFileSync('/etc/os-release', 'utf8');
  } catch {
    osRelease = undefined;
  }
  return {
    env: { CHROME_PATH: process.env.CHROME_PATH, PATH: process.env.PATH, HOME: process.env.HOME },
    platform: process.platform,
    isRoot: process.getuid?.() === 0,
    osRelease,
    exists: (file) => {
      try {
        return fs.statSync(file).isFile();
      } catch {
        return false;
      }
    },
  };
}

/** The browser to launch, or an error that says how to get one (never installs). */
export function browserPath(): string {
  const decision = decideBrowser(probeMachine(), false);
  if (decision.kind === 'found') return decision.path;
  throw new Error(decision.kind === 'missing' ? decision.message : 'No Chromium found.');
}
