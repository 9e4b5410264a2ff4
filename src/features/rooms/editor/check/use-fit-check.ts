// Runs the fit check for a layout in a worker and keeps only the newest layout's findings.
import { useEffect, useRef, useState } from 'react';
import type { Finding } from '../../../../../shared/analysis/fit/finding';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import type { FitRequest } from './fit-worker';

export interface FitResult {
  findings: Finding[];
  ms: number;
  error?: string;
  /** Whether the layout has changed since these findings were worked out: the newer ones are on their way. */
  pending: boolean;
}

/** Live fit-check findings for a layout, computed in a worker; only the newest layout's answer is kept. */
export function useFitCheck(shell: RoomShell, pieces: Piece[], walkwayMm: number): FitResult | null {
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  const busy = useRef(false);
  const pending = useRef<FitRequest | null>(null);
  const [result, setResult] = useState<{ seq: number; findings: Finding[]; ms: number; error?: string } | null>(null);
  // The layout last sent to be checked, as state so the pending mark shows as soon as it changes.
  const [asked, setAsked] = useState(0);

  useEffect(() => {
    const w = new Worker(new URL('./fit-worker.ts', import.meta.url), { type: 'module' });
    worker.current = w;
    w.onmessage = (e: MessageEvent<{ seq: number; findings: Finding[]; ms: number; error?: string }>) => {
      busy.current = false;
      if (e.data.seq === seq.current) setResult(e.data);
      // While the worker was busy the layout moved on: check the newest one only.
      const next = pending.current;
      pending.current = null;
      if (next) {
        busy.current = true;
        w.postMessage(next);
      }
    };
    return () => w.terminate();
  }, []);

  useEffect(() => {
    const w = worker.current;
    if (!w) return;
    seq.current += 1;
    setAsked(seq.current);
    const request: FitRequest = { seq: seq.current, shell, pieces, walkwayMm };
    if (busy.current) pending.current = request;
    else {
      busy.current = true;
      w.postMessage(request);
    }
  }, [shell, pieces, walkwayMm]);

  return result ? { findings: result.findings, ms: result.ms, error: result.error, pending: result.seq !== asked } : null;
}
