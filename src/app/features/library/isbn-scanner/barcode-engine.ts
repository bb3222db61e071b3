/** Which detector reads EAN-13 barcodes on this device. */
export type BarcodeEngine = 'native' | 'zxing';

/** The part of the Shape Detection API's `BarcodeDetector` class we use (not in TypeScript's DOM lib). */
export interface BarcodeDetectorClass {
  new (options: { formats: string[] }): { detect(source: HTMLVideoElement): Promise<{ rawValue: string }[]> };
  getSupportedFormats(): Promise<string[]>;
}

/**
 * The browser's own `BarcodeDetector` when it exists and says it reads 'ean_13' (WICG Shape
 * Detection API; some browsers have the class but support few or no formats), otherwise zxing.
 * `scope` is `globalThis` except in specs.
 */
export async function pickBarcodeEngine(scope: object = globalThis): Promise<BarcodeEngine> {
  if (!('BarcodeDetector' in scope)) return 'zxing';
  try {
    const formats = await (scope.BarcodeDetector as BarcodeDetectorClass).getSupportedFormats();
    return formats.includes('ean_13') ? 'native' : 'zxing';
  } catch {
    return 'zxing';
  }
}
