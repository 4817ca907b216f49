/// <reference lib="webworker" />
/**
 * The photo tracer's web worker: decodes nothing itself (it gets an ImageBitmap), draws the photo at most
 * MAX_SIDE pixels on its long side, loads opencv.js on first use and runs `tracePhoto`, off the page's
 * main thread and off the server.
 */
import { TraceError } from '@grading';
import { loadOpenCv } from './load-opencv';
import { tracePhoto } from './trace-photo';
import type { TraceRequest, TraceResponse } from './trace-messages';

const MAX_SIDE = 3200;

self.onmessage = async (e: MessageEvent<TraceRequest>) => {
  const { bitmap, kind, paper, toleranceMm } = e.data;
  try {
    const scale = Math.min(1, MAX_SIDE / Math.max(bitmap.width, bitmap.height));
    const w = Math.round(bitmap.width * scale), h = Math.round(bitmap.height * scale);
    const canvas = new OffscreenCanvas(w, h);
    const ctx = canvas.getContext('2d', { willReadFrequently: true })!;
    ctx.drawImage(bitmap, 0, 0, w, h);
    bitmap.close();
    const image = ctx.getImageData(0, 0, w, h);
    const cv = await loadOpenCv();
    const r = tracePhoto(cv, { width: w, height: h, data: image.data }, { kind, paper, toleranceMm });
    const view = new Uint8ClampedArray(r.view.data);
    const reply: TraceResponse = {
      ok: true,
      outline: r.outline, toleranceMm: r.toleranceMm, markResidualMm: r.markResidualMm, pxPerMm: r.pxPerMm,
      view: { width: r.view.width, height: r.view.height, data: view }, viewOrigin: r.viewOrigin,
    };
    (self as unknown as Worker).postMessage(reply, [view.buffer]);
  } catch (err) {
    const reply: TraceResponse = { ok: false, code: err instanceof TraceError ? err.code : 'failed', message: (err as Error).message ?? String(err) };
    (self as unknown as Worker).postMessage(reply);
  }
};
