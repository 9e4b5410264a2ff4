// The queued-mail polling rule: ask soon while anything is sending, less often while refused, stop once settled.
import { describe, expect, it } from 'vitest';
import { mailPollInterval } from './queued-mail';

describe('mailPollInterval', () => {
  it('asks every 2 s while any message is sending, whatever else is listed', () => {
    expect(mailPollInterval(['sent', 'failing', 'sending'])).toBe(2_000);
  });
  it('asks every 20 s while messages are only failing', () => {
    expect(mailPollInterval(['sent', 'failing', undefined])).toBe(20_000);
  });
  it('stops once every message is sent or given up on, or there is none', () => {
    expect(mailPollInterval(['sent', 'failed', undefined])).toBe(false);
    expect(mailPollInterval([])).toBe(false);
  });
});
