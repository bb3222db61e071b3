import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { MatDialogRef } from '@angular/material/dialog';

import { CAMERA, type Camera } from './camera';
import { IsbnScanner } from './isbn-scanner';

/**
 * EAN-13 bars drawn on a canvas, for a fake camera. Tables from the GS1 General Specifications
 * EAN/UPC symbol character sets (from memory): set A ("L") codes per digit, set C ("R") their
 * complement, set B ("G") set C reversed; the first digit picks the A/B pattern of the left
 * half; guards 101, 01010, 101. zxing reading them back is the check that they are right.
 */
const SET_A = ['0001101', '0011001', '0010011', '0111101', '0100011', '0110001', '0101111', '0111011', '0110111', '0001011'];
const LEFT_PARITY = ['AAAAAA', 'AABABB', 'AABBAB', 'AABBBA', 'ABAABB', 'ABBAAB', 'ABBBAA', 'ABABAB', 'ABABBA', 'ABBABA'];
const setC = (digit: number) => [...SET_A[digit]!].map((bit) => (bit === '1' ? '0' : '1')).join('');
const setB = (digit: number) => [...setC(digit)].reverse().join('');

function ean13Modules(code: string): string {
  const digits = [...code].map(Number);
  const left = digits.slice(1, 7).map((digit, i) => (LEFT_PARITY[digits[0]!]![i] === 'A' ? SET_A[digit]! : setB(digit)));
  const right = digits.slice(7).map(setC);
  return ['101', ...left, '01010', ...right, '101'].join('');
}

/** A canvas showing one barcode, white around it (the quiet zone), as a camera would see it. */
function barcodeCanvas(code: string): HTMLCanvasElement {
  const canvas = document.createElement('canvas');
  canvas.width = 640;
  canvas.height = 480;
  const context = canvas.getContext('2d')!;
  context.fillStyle = '#fff';
  context.fillRect(0, 0, canvas.width, canvas.height);
  context.fillStyle = '#000';
  const moduleWidth = 4;
  const start = (canvas.width - 95 * moduleWidth) / 2;
  [...ean13Modules(code)].forEach((bit, i) => {
    if (bit === '1') context.fillRect(start + i * moduleWidth, 120, moduleWidth, 240);
  });
  return canvas;
}

/** A camera whose picture is a canvas; keeps every stream it gave out. */
class CanvasCamera implements Camera {
  readonly streams: MediaStream[] = [];
  constructor(readonly canvas: HTMLCanvasElement) {}
  async getUserMedia(_constraints?: MediaStreamConstraints): Promise<MediaStream> {
    const stream = this.canvas.captureStream(15);
    this.streams.push(stream);
    // A captured canvas sends frames only when drawn on; keep it drawing like a live camera.
    const context = this.canvas.getContext('2d')!;
    const timer = setInterval(() => context.drawImage(this.canvas, 0, 0), 60);
    // stop() fires no 'ended' event (Media Capture and Streams), so stop drawing from stop itself.
    const stop = MediaStreamTrack.prototype.stop;
    stream.getTracks().forEach((track) => {
      track.stop = function () {
        clearInterval(timer);
        stop.call(this);
      };
    });
    return stream;
  }
}

async function until(condition: () => boolean, fixture: ComponentFixture<unknown>, timeoutMs = 4000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!condition()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting; the dialog says: ${(fixture.nativeElement as HTMLElement).textContent}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
    await fixture.whenStable();
  }
}

describe('IsbnScanner', () => {
  let close: jasmine.Spy;

  function open(camera: Camera | null): ComponentFixture<IsbnScanner> {
    close = jasmine.createSpy('close');
    TestBed.configureTestingModule({
      imports: [IsbnScanner],
      providers: [
        { provide: CAMERA, useValue: camera },
        { provide: MatDialogRef, useValue: { close } },
      ],
    });
    return TestBed.createComponent(IsbnScanner);
  }

  const text = (fixture: ComponentFixture<unknown>) => (fixture.nativeElement as HTMLElement).textContent ?? '';

  it('without camera support, says so and offers to type the ISBN instead', async () => {
    const fixture = open(null);
    await fixture.whenStable();
    await until(() => text(fixture).includes('Type the ISBN instead'), fixture);

    const element = fixture.nativeElement as HTMLElement;
    expect(element.querySelector('[role="alert"]')?.textContent).toContain('This browser cannot use a camera here.');
    expect(element.querySelector('button')?.textContent?.trim()).toBe('Type it instead');
    expect(element.querySelector<HTMLElement>('.viewfinder')?.hidden).toBeTrue();
    expect(text(fixture)).toContain('nothing is recorded or sent');
    expect(close).not.toHaveBeenCalled();
  });

  it('when the reader refuses the camera, says how to allow it and offers to type instead', async () => {
    const fixture = open({ getUserMedia: () => Promise.reject(new DOMException('Permission denied', 'NotAllowedError')) });
    await until(() => text(fixture).includes('Type the ISBN instead'), fixture);

    expect(text(fixture)).toContain('Lamplight may not use the camera.');
    expect(text(fixture)).toContain('Type it instead');
  });

  it('asks for the rear camera, reads a book barcode, closes with its ISBN-13 and turns the camera off', async () => {
    // ISBN Users' Manual example 978-92-95055-12-4.
    const camera = new CanvasCamera(barcodeCanvas('9789295055124'));
    const asked = spyOn(camera, 'getUserMedia').and.callThrough();
    const fixture = open(camera);
    await until(() => close.calls.count() > 0, fixture);

    expect(asked).toHaveBeenCalledOnceWith({ video: { facingMode: 'environment' }, audio: false });
    expect(close).toHaveBeenCalledOnceWith('9789295055124');
    expect(camera.streams[0]!.getTracks().every((track) => track.readyState === 'ended')).toBeTrue();
    fixture.destroy();
  });

  it('scans on past a barcode that is not a book, saying so calmly, and stops the camera when closed', async () => {
    // GS1 General Specifications §7.9.1 check digit example 629104150021 3 (from memory): a valid EAN-13, not an ISBN.
    const camera = new CanvasCamera(barcodeCanvas('6291041500213'));
    const fixture = open(camera);
    await until(() => text(fixture).includes('That barcode is not a book’s ISBN.'), fixture);

    expect(close).not.toHaveBeenCalled();
    expect(camera.streams[0]!.getTracks().some((track) => track.readyState === 'live')).toBeTrue();
    fixture.destroy(); // what closing the dialog by Cancel, Escape or the backdrop does
    expect(camera.streams[0]!.getTracks().every((track) => track.readyState === 'ended')).toBeTrue();
  });
});
