// Memory for uploads. Photo and model uploads are held in memory while they are checked (multer's
// memory storage, within each route's limits), so many large uploads at once could take more than
// the process has. Each upload reserves the bytes its request declares (Content-Length; a request
// without one reserves its route's ceiling) before a byte is read, and gives them back when its
// handler is done. A request declaring more than its route could ever accept is refused at once
// (413); one that would take the instance past UPLOAD_MEMORY_MB waits for no one: it is answered
// 503 with Retry-After, and the page tries again.
import type { Request } from 'express';
import { HttpError } from './errors';

/** Multipart boundaries, headers and the small text fields around the files (generous on purpose). */
export const MULTIPART_SLACK_BYTES = 1024 * 1024;
const BUSY_RETRY_S = 5;

export class UploadRoom {
  private held = 0;

  constructor(readonly totalBytes: number) {}

  /** Bytes reserved by uploads in progress on this instance. */
  get heldBytes(): number {
    return this.held;
  }

  /**
   * Reserves room for `req`, whose files can be at most `ceilingBytes` in all; `tooLarge` is the
   * refusal's wording. Returns the release (safe to call twice).
   */
  reserve(req: Request, ceilingBytes: number, tooLarge: string): () => void {
    const ceiling = ceilingBytes + MULTIPART_SLACK_BYTES;
    const header = req.headers['content-length'];
    const declared = header !== undefined && /^\d{1,15}$/.test(header) ? Number(header) : ceiling;
    if (declared > ceiling) {
      // The unread body is not worth receiving: the connection closes after the answer.
      req.res?.setHeader('Connection', 'close');
      throw new HttpError(413, 'upload_too_large', tooLarge);
    }
    if (this.held + declared > this.totalBytes)
      throw new HttpError(
        503,
        'uploads_busy',
        'Parlour is receiving many uploads just now. Try again in a few seconds.',
        undefined,
        undefined,
        { 'Retry-After': String(BUSY_RETRY_S) },
      );
    this.held += declared;
    let released = false;
    return () => {
      if (released) return;
      released = true;
      this.held -= declared;
    };
  }

  /** Runs `work` holding room for `req`; the room is given back however it ends. */
  async with<T>(req: Request, ceilingBytes: number, tooLarge: string, work: () => Promise<T>): Promise<T> {
    const release = this.reserve(req, ceilingBytes, tooLarge);
    // A safety net: a connection that goes away gives its room back even if the work never ends.
    req.res?.once('close', release);
    try {
      return await work();
    } finally {
      release();
    }
  }
}
