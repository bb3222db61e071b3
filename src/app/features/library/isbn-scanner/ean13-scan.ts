import type { BarcodeDetectorClass, BarcodeEngine } from './barcode-engine';

/** A running scan of a playing video; `stop` ends it (the camera itself is the caller's). */
export interface Ean13Scan {
  stop(): void;
}

/** Time between attempts: often enough to feel instant, rare enough to spare a phone's battery. */
const SCAN_INTERVAL_MS = 150;

/**
 * Reads EAN-13 barcodes from a video that is playing until stopped, passing each value read to
 * `onValue` (the same code may come many times). zxing is imported only here, on first use,
 * so it stays out of the app's initial bundle.
 */
export async function startEan13Scan(video: HTMLVideoElement, engine: BarcodeEngine, onValue: (rawValue: string) => void): Promise<Ean13Scan> {
  return engine === 'native' ? nativeScan(video, onValue) : zxingScan(video, onValue);
}

function nativeScan(video: HTMLVideoElement, onValue: (rawValue: string) => void): Ean13Scan {
  const Detector = (globalThis as unknown as { BarcodeDetector: BarcodeDetectorClass }).BarcodeDetector;
  const detector = new Detector({ formats: ['ean_13'] });
  let stopped = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const attempt = async () => {
    try {
      const codes = await detector.detect(video);
      if (!stopped) codes.forEach((code) => onValue(code.rawValue));
    } catch {
      // A frame that is not ready yet; the next attempt will do.
    }
    if (!stopped) timer = setTimeout(attempt, SCAN_INTERVAL_MS);
  };
  void attempt();
  return {
    stop: () => {
      stopped = true;
      clearTimeout(timer);
    },
  };
}

async function zxingScan(video: HTMLVideoElement, onValue: (rawValue: string) => void): Promise<Ean13Scan> {
  const [{ BrowserMultiFormatReader }, { BarcodeFormat, DecodeHintType }] = await Promise.all([import('@zxing/browser'), import('@zxing/library')]);
  // Only EAN-13: fewer formats to try per frame, and no false reads from other symbologies.
  const hints = new Map([[DecodeHintType.POSSIBLE_FORMATS, [BarcodeFormat.EAN_13]]]);
  const reader = new BrowserMultiFormatReader(hints, { delayBetweenScanAttempts: SCAN_INTERVAL_MS });
  // The video is ours and already playing: zxing only reads frames from it (`scan` neither
  // plays nor disposes it, unlike the decodeFrom… helpers).
  const controls = reader.scan(video, (result) => {
    if (result) onValue(result.getText());
  });
  return { stop: () => controls.stop() };
}
