/**
 * opencv.js (WebAssembly, about 10 MB), loaded once. Imported statically: only the trace worker, the tests
 * and the benchmark import this file, so the app's own pages never download it.
 */
import * as cvModule from '@techstark/opencv-js';
import type { Cv } from './trace-photo';

type Loaded = Cv & { onRuntimeInitialized?: () => void; then?: unknown };
let ready: Promise<void> | null = null;
let loaded: Loaded | null = null;

/** The cv module once its runtime is ready. */
export async function loadOpenCv(): Promise<Cv> {
  const cv = ((cvModule as unknown as { default?: Loaded }).default ?? cvModule) as Loaded;
  // The Emscripten module is a thenable that resolves to itself: resolving a promise with it would never
  // end. Wait for the runtime on our own promise, then take `then` away before handing the module out.
  ready ??= new Promise<void>((resolve) => {
    if (cv.Mat) resolve();
    else cv.onRuntimeInitialized = () => resolve();
  });
  await ready;
  if (typeof cv.then === 'function') delete cv.then;
  loaded = cv;
  return loaded;
}
