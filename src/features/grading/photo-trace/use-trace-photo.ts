import { useCallback, useEffect, useRef, useState } from 'react';
import type { CalibrationKind, CalibrationPaper } from '@shared/calibration/calibration-sheet';
import type { TraceRequest, TraceResponse } from './trace-messages';

export type TraceState =
  | { status: 'idle' }
  | { status: 'tracing' }
  | { status: 'done'; result: Extract<TraceResponse, { ok: true }>; viewUrl: string }
  | { status: 'failed'; code: string; message: string };

/** What can go wrong, by the worker's code; the words for each are `photo.failures.<code>` in ../words.ts. */
export const TRACE_FAILURES: readonly string[] = ['marks_not_found', 'no_piece', 'piece_touches_edge', 'failed'];

/** Trace a photo in a web worker (created on first use, ended when the component goes). */
export function useTracePhoto() {
  const worker = useRef<Worker | null>(null);
  const [state, setState] = useState<TraceState>({ status: 'idle' });
  useEffect(() => () => worker.current?.terminate(), []);
  useEffect(() => () => { if (state.status === 'done') URL.revokeObjectURL(state.viewUrl); }, [state]);

  const trace = useCallback(async (file: File, kind: CalibrationKind, paper: CalibrationPaper) => {
    setState({ status: 'tracing' });
    try {
      const bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
      worker.current ??= new Worker(new URL('./photo-trace.worker.ts', import.meta.url), { type: 'module' });
      const w = worker.current;
      const reply = await new Promise<TraceResponse>((resolve, reject) => {
        w.onmessage = (e: MessageEvent<TraceResponse>) => resolve(e.data);
        w.onerror = (e) => reject(new Error(e.message || 'The tracer stopped'));
        const req: TraceRequest = { bitmap, kind, paper, toleranceMm: 0.5 };
        w.postMessage(req, [bitmap]);
      });
      if (!reply.ok) { setState({ status: 'failed', code: reply.code, message: reply.message }); return; }
      const canvas = document.createElement('canvas');
      canvas.width = reply.view.width; canvas.height = reply.view.height;
      canvas.getContext('2d')!.putImageData(new ImageData(new Uint8ClampedArray(reply.view.data), reply.view.width, reply.view.height), 0, 0);
      const blob = await new Promise<Blob | null>((r) => canvas.toBlob(r, 'image/jpeg', 0.85));
      setState({ status: 'done', result: reply, viewUrl: blob ? URL.createObjectURL(blob) : canvas.toDataURL('image/jpeg', 0.85) });
    } catch (e) {
      setState({ status: 'failed', code: 'failed', message: (e as Error).message });
    }
  }, []);
  return { state, trace, reset: () => setState({ status: 'idle' }) };
}
