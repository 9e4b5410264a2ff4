// Queued mail on the designer's pages: how it is going in words, and how often a page that lists it
// asks again while some has not gone (soon while sending, less often while refused, never once settled).
import type { QueuedMailState } from '../../shared/schemas/outbox';

const SENDING_POLL_MS = 2_000;
const FAILING_POLL_MS = 20_000;

/** A refetch interval for a list of queued mail states (false: stop asking). */
export function mailPollInterval(states: readonly (QueuedMailState | undefined)[]): number | false {
  if (states.includes('sending')) return SENDING_POLL_MS;
  if (states.includes('failing')) return FAILING_POLL_MS;
  return false;
}

/** How a queued e-mail is going, in the designer's words (project mail, open invitations). */
export const MAIL_STATE_TEXT: Record<QueuedMailState, string> = {
  sending: 'Sending…',
  sent: 'Sent',
  failing: 'Not sent yet: trying again',
  failed: 'Could not be sent',
};
