import { pickBarcodeEngine } from './barcode-engine';

/** A stand-in for a browser's BarcodeDetector class that supports these formats. */
function detectorScope(supported: () => Promise<string[]>) {
  return { BarcodeDetector: Object.assign(class {}, { getSupportedFormats: supported }) };
}

describe('pickBarcodeEngine', () => {
  it('uses zxing where the browser has no BarcodeDetector', async () => {
    expect(await pickBarcodeEngine({})).toBe('zxing');
  });

  it("uses the browser's detector when it reads EAN-13", async () => {
    expect(await pickBarcodeEngine(detectorScope(async () => ['qr_code', 'ean_13', 'ean_8']))).toBe('native');
  });

  it('uses zxing when the browser detector lacks EAN-13 or cannot say', async () => {
    expect(await pickBarcodeEngine(detectorScope(async () => ['qr_code']))).toBe('zxing');
    // Some desktop builds ship the class with no formats at all.
    expect(await pickBarcodeEngine(detectorScope(async () => []))).toBe('zxing');
    expect(await pickBarcodeEngine(detectorScope(() => Promise.reject(new Error('not available'))))).toBe('zxing');
  });
});
