import { useCallback, useEffect, useRef, useState } from 'react';
import type { CalibrationKind, CalibrationPaper } from '@shared/calibration/calibration-sheet';
import type { TraceRequest, TraceResponse } from './trace-messages';

export type TraceState =
  | { status: 'idle' }
  | { status: 'tracing' }
  | { status: 'done'; result: Extract<TraceResponse, { ok: true }>; viewUrl: string }
  | { status: 'failed'; code: string; message: string };

/** Plain words for what went wrong, by the worker's code. */
export const TRACE_FAILURE_TEXT: Record<string, string> = {
  marks_not_found: 'The four corner marks of the sheet were not all found. Take the photo again from above, with all four marks in view and none covered.',
  no_piece: 'No piece was found on the sheet. Lay the piece on the field and take the photo again.',
  piece_touches_edge: 'The piece reaches the edge of the field. Move it inside, clear of the edge, and take the photo again.',
  failed: 'The photo could not be traced.',
};

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
