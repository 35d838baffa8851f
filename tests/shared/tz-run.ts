// Run by timezone.test.ts in a child process with a different TZ: prints the machine offset and the results.
import { findHeadroom, simulateTrip } from '@/shared/engine';
import { desertSpringLoop, highlandLoop } from '@/shared/engine/demo-trips';

const out = {
  machineOffsetMin: new Date(Date.UTC(2027, 8, 15)).getTimezoneOffset(),
  results: [simulateTrip(highlandLoop), simulateTrip(desertSpringLoop)],
  headroom: findHeadroom(highlandLoop),
};
process.stdout.write(JSON.stringify(out));
