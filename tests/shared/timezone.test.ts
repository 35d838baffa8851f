// The result must not depend on the machine's time zone: run the same trips in child processes whose TZ
// differs (UTC and Pacific/Chatham, +12:45/+13:45) and compare the JSON byte for byte.
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

function runWithTz(tz: string): { machineOffsetMin: number; rest: string } {
  const cli = resolve(__dirname, '../../node_modules/tsx/dist/cli.mjs');
  const script = resolve(__dirname, 'tz-run.ts');
  const r = spawnSync(process.execPath, [cli, script], {
    env: { ...process.env, TZ: tz },
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  if (r.status !== 0) throw new Error(r.stderr);
  const parsed = JSON.parse(r.stdout) as { machineOffsetMin: number; results: unknown; headroom: unknown };
  return { machineOffsetMin: parsed.machineOffsetMin, rest: JSON.stringify([parsed.results, parsed.headroom]) };
}

describe('machine time zone', () => {
  it('when run under TZ=UTC and TZ=Pacific/Chatham, then the simulation and headroom are identical', () => {
    const utc = runWithTz('UTC');
    const chatham = runWithTz('Pacific/Chatham');
    expect(utc.machineOffsetMin).toBe(0);
    expect(chatham.machineOffsetMin).toBeLessThan(-700); // proves the child really ran in Chatham time
    expect(chatham.rest).toBe(utc.rest);
  });
});
