// sendForm sends again after the wait a busy server asks for, and shows any other refusal at once.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { sendForm } from './upload';

interface Answer {
  status: number;
  body: unknown;
  retryAfter?: string;
}

/** A stand-in XMLHttpRequest answering each send with the next of `answers`. */
function fakeXhr(answers: Answer[]) {
  const sent: string[] = [];
  class FakeXhr {
    status = 0;
    response: unknown = null;
    responseType = '';
    upload: { onprogress?: (e: { lengthComputable: boolean; loaded: number; total: number }) => void } = {};
    onload?: () => void;
    onerror?: () => void;
    onabort?: () => void;
    private answer?: Answer;
    open(method: string, path: string) {
      sent.push(`${method} ${path}`);
    }
    setRequestHeader() {}
    getResponseHeader(name: string) {
      return name.toLowerCase() === 'retry-after' ? (this.answer?.retryAfter ?? null) : null;
    }
    abort() {
      this.onabort?.();
    }
    send() {
      this.answer = answers.shift()!;
      queueMicrotask(() => {
        this.upload.onprogress?.({ lengthComputable: true, loaded: 1, total: 1 });
        this.status = this.answer!.status;
        this.response = this.answer!.body;
        this.onload?.();
      });
    }
  }
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return sent;
}

const busy: Answer = {
  status: 503,
  body: { error: { code: 'uploads_busy', message: 'Parlour is receiving many uploads just now. Try again in a few seconds.' } },
  retryAfter: '5',
};

afterEach(() => {
  vi.unstubAllGlobals();
  vi.useRealTimers();
});

describe('sendForm', () => {
  it('waits as long as a busy server asks, then sends again', async () => {
    vi.useFakeTimers();
    const sent = fakeXhr([busy, busy, { status: 201, body: { model: { id: 'm1' } } }]);
    const progress: number[] = [];
    const done = sendForm<{ model: { id: string } }>('/api/piece-models', {} as FormData, {
      okStatus: 201,
      onProgress: (f) => progress.push(f),
    });
    await vi.advanceTimersByTimeAsync(4_900);
    expect(sent).toHaveLength(1);
    await vi.advanceTimersByTimeAsync(200);
    expect(sent).toHaveLength(2);
    await vi.advanceTimersByTimeAsync(5_000);
    expect(await done).toEqual({ model: { id: 'm1' } });
    expect(sent).toEqual(['POST /api/piece-models', 'POST /api/piece-models', 'POST /api/piece-models']);
    // Progress starts again from nothing for each new try.
    expect(progress).toEqual([1, 0, 1, 0, 1]);
  });

  it('gives up after five busy answers with the server’s words', async () => {
    vi.useFakeTimers();
    const sent = fakeXhr([busy, busy, busy, busy, busy, busy]);
    const done = sendForm('/api/finishes/photos', {} as FormData, { okStatus: 201 });
    const seen = done.catch((e: Error) => e);
    await vi.advanceTimersByTimeAsync(60_000);
    expect(((await seen) as Error).message).toMatch(/receiving many uploads/);
    expect(sent).toHaveLength(5);
  });

  it('shows any other refusal at once', async () => {
    const sent = fakeXhr([{ status: 413, body: { error: { code: 'upload_too_large', message: 'Too big.' } } }]);
    await expect(sendForm('/api/piece-models', {} as FormData, { okStatus: 201 })).rejects.toMatchObject({
      status: 413,
      code: 'upload_too_large',
    });
    expect(sent).toHaveLength(1);
  });
});
