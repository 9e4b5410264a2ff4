// Tests the client address key rate limits count by: IPv4 on its own (IPv4-mapped too), IPv6 by
// its /64, anything else as it is.
import { describe, expect, it } from 'vitest';
import { clientAddressKey } from './client-address';

describe('clientAddressKey', () => {
  it('counts an IPv4 address on its own, also when it arrives IPv4-mapped', () => {
    expect(clientAddressKey('203.0.113.7')).toBe('203.0.113.7');
    expect(clientAddressKey('::ffff:203.0.113.7')).toBe('203.0.113.7');
    expect(clientAddressKey('::FFFF:127.0.0.1')).toBe('127.0.0.1');
  });

  it('counts IPv6 addresses of one /64 together, however they are written', () => {
    const key = '2001:db8:1:2::/64';
    expect(clientAddressKey('2001:db8:1:2::1')).toBe(key);
    expect(clientAddressKey('2001:0db8:0001:0002:aaaa:bbbb:cccc:dddd')).toBe(key);
    expect(clientAddressKey('2001:DB8:1:2:0:0:0:9')).toBe(key);
    expect(clientAddressKey('2001:db8:1:3::1')).not.toBe(key);
    expect(clientAddressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
    expect(clientAddressKey('::1')).toBe('0:0:0:0::/64');
    expect(clientAddressKey('fe80::1%eth0')).toBe('fe80:0:0:0::/64');
    expect(clientAddressKey('64:ff9b::192.0.2.33')).toBe('64:ff9b:0:0::/64');
  });

  it('keeps anything else as it is, and names a missing address', () => {
    expect(clientAddressKey(undefined)).toBe('unknown');
    expect(clientAddressKey('not-an-address')).toBe('not-an-address');
  });
});
