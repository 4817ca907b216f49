import { useEffect, useRef, useState } from 'react';
import { parseBundleQr } from '@shared/schemas/floor';
import { useTranslation } from '@/lib/i18n';

/** Reads a bundle ticket's QR code from the phone's back camera, frame by frame. */
export function QrScanner({ onBundle, onClose }: { onBundle: (v: { batchId: number; bundleNumber: number }) => void; onClose: () => void }) {
  const { t } = useTranslation();
  const video = useRef<HTMLVideoElement>(null);
  const [status, setStatus] = useState(() => t('floor.camera.starting'));

  useEffect(() => {
    let stream: MediaStream | null = null;
    let frame = 0;
    let stopped = false;
    const canvas = document.createElement('canvas');
    const ctx = canvas.getContext('2d', { willReadFrequently: true });
    let decode: typeof import('jsqr').default | null = null;
    const tick = () => {
      const v = video.current;
      if (stopped || !v || !ctx) return;
      if (decode && v.readyState === v.HAVE_ENOUGH_DATA && v.videoWidth) {
        canvas.width = v.videoWidth;
        canvas.height = v.videoHeight;
        ctx.drawImage(v, 0, 0);
        const img = ctx.getImageData(0, 0, canvas.width, canvas.height);
        const code = decode(img.data, img.width, img.height, { inversionAttempts: 'dontInvert' });
        if (code?.data) {
          const parsed = parseBundleQr(code.data);
          if (parsed) {
            onBundle(parsed);
            return;
          }
          setStatus(t('floor.camera.notTicket'));
        }
      }
      frame = requestAnimationFrame(tick);
    };
    (async () => {
      if (!navigator.mediaDevices?.getUserMedia) {
        setStatus(t('floor.camera.noSecure'));
        return;
      }
      try {
        // The QR decoder is fetched only when someone opens the camera.
        decode = (await import('jsqr')).default;
        stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
        if (stopped) return;
        if (video.current) {
          video.current.srcObject = stream;
          await video.current.play();
        }
        setStatus(t('floor.camera.point'));
        frame = requestAnimationFrame(tick);
      } catch {
        setStatus(t('floor.camera.unavailable'));
      }
    })();
    return () => {
      stopped = true;
      cancelAnimationFrame(frame);
      stream?.getTracks().forEach((t) => t.stop());
    };
  }, [onBundle, t]);

  return (
    <div className="space-y-2">
      <div className="relative overflow-hidden rounded-lg bg-ink-900">
        <video ref={video} className="aspect-square w-full object-cover" muted playsInline aria-label={t('floor.camera.view')} />
        <div aria-hidden className="pointer-events-none absolute inset-8 rounded-lg border-4 border-saffron-500/80" />
      </div>
      <p role="status" className="text-sm text-ink-600">{status}</p>
      <button type="button" className="btn-quiet w-full" onClick={onClose}>{t('floor.camera.close')}</button>
    </div>
  );
}
