// The key a client address is counted under. An IPv4 address counts on its own (also when it
// arrives IPv4-mapped, ::ffff:a.b.c.d); an IPv6 address counts by its /64 network, since one
// subscriber is usually given a whole /64 and could otherwise change address per request
// (RFC 6177 recommends /48 to /64 per site; counting /64 is common practice).
import { isIP } from 'node:net';

const MAPPED_V4 = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i;

export function clientAddressKey(address: string | undefined): string {
  if (!address) return 'unknown';
  const mapped = MAPPED_V4.exec(address);
  if (mapped) return mapped[1];
  const plain = address.split('%')[0]; // a zone index (fe80::1%eth0) names the interface, not the host
  if (isIP(plain) !== 6) return address;
  return `${expandIPv6(plain).slice(0, 4).join(':')}::/64`;
}

/** The eight groups of an IPv6 address, each without leading zeros. */
function expandIPv6(address: string): string[] {
  const [head, tail] = address.includes('::') ? address.split('::') : [address, undefined];
  const groups = (text: string) => (text ? text.split(':') : []);
  const left = groups(head);
  const right = tail === undefined ? [] : groups(tail);
  // An embedded IPv4 tail (::1.2.3.4) fills the last two groups.
  const last = right.length ? right : left;
  if (last.length && last[last.length - 1].includes('.')) {
    const [a, b, c, d] = last.pop()!.split('.').map(Number);
    last.push(((a << 8) | b).toString(16), ((c << 8) | d).toString(16));
  }
  const zeros = tail === undefined ? [] : Array.from({ length: 8 - left.length - right.length }, () => '0');
  return [...left, ...zeros, ...right].map((g) => parseInt(g, 16).toString(16));
}
