import net from 'node:net';
import { z } from 'zod';

/**
 * Which proxies Express may believe about the client's address (X-Forwarded-For): none (the default: the
 * address is the connection's own), a number of proxy hops, or the proxies' addresses and subnets. Believing
 * a header no proxy wrote would let any client choose its own rate-limit bucket.
 */
export type TrustProxy = false | number | string[];

// proxy-addr's names for common ranges (Express passes the setting to it).
const NAMED_RANGES = new Set(['loopback', 'linklocal', 'uniquelocal']);

function isAddressOrSubnet(entry: string): boolean {
  if (NAMED_RANGES.has(entry)) return true;
  const [address = '', prefix, ...rest] = entry.split('/');
  const family = net.isIP(address);
  if (family === 0 || rest.length > 0) return false;
  if (prefix === undefined) return true;
  if (net.isIP(prefix) === family) return true; // a netmask such as 255.255.255.0
  const bits = Number(prefix);
  return /^\d{1,3}$/.test(prefix) && bits <= (family === 4 ? 32 : 128);
}

/** TRUST_PROXY: unset or "false" trusts no proxy; "1" one hop; "loopback, 10.0.0.0/8" those addresses. */
export const trustProxySchema = z
  .string()
  .optional()
  .transform((raw, ctx): TrustProxy => {
    const value = raw?.trim() ?? '';
    if (value === '' || value === 'false' || value === '0') return false;
    if (/^\d+$/.test(value)) return Number(value);
    const entries = value.split(',').map((entry) => entry.trim());
    const bad = entries.filter((entry) => !isAddressOrSubnet(entry));
    if (bad.length > 0) {
      ctx.addIssue({
        code: 'custom',
        message: `TRUST_PROXY takes a number of proxies or their addresses (e.g. "1" or "loopback, 10.0.0.0/8"); not ${bad.join(', ')}`,
      });
      return z.NEVER;
    }
    return entries;
  });
