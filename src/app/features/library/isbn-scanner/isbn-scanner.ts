import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, ElementRef, inject, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';

import { pickBarcodeEngine } from './barcode-engine';
import { readBookBarcode } from './book-isbn-from-barcode';
import { CAMERA, cameraProblem, type CameraProblem } from './camera';
import { startEan13Scan, type Ean13Scan } from './ean13-scan';

/** Where the scanner is: asking for the camera, reading frames, or unable to use a camera. */
export type ScannerState = 'starting' | 'scanning' | CameraProblem;

/** What to tell the reader for each reason the camera cannot be used. */
const PROBLEMS: Record<CameraProblem, string> = {
  unsupported: 'This browser cannot use a camera here.',
  denied: 'Lamplight may not use the camera. You can allow it in this site’s settings in your browser.',
  'no-camera': 'This device has no camera Lamplight can use.',
  failed: 'The camera would not start. Another app may be using it.',
};

/**
 * Reads a book's ISBN from its barcode with the rear camera. Opened with MatDialog; closes
 * with the ISBN-13 digits, or with nothing when the reader cancels or types it instead.
 * Frames are read on this device only; the camera is released whenever the dialog closes.
 */
@Component({
  selector: 'll-isbn-scanner',
  imports: [MatDialogModule, MatButtonModule],
  templateUrl: './isbn-scanner.html',
  styleUrl: './isbn-scanner.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IsbnScanner {
  private readonly dialog = inject<MatDialogRef<IsbnScanner, string>>(MatDialogRef);
  private readonly camera = inject(CAMERA);
  private readonly video = viewChild<ElementRef<HTMLVideoElement>>('video');

  protected readonly state = signal<ScannerState>('starting');
  /** Said calmly while scanning goes on: the last barcode was not a book's. */
  protected readonly notice = signal('');
  protected readonly problem = computed(() => {
    const state = this.state();
    return state === 'starting' || state === 'scanning' ? '' : PROBLEMS[state];
  });

  private stream: MediaStream | null = null;
  private scan: Ean13Scan | null = null;
  private finished = false;

  constructor() {
    // Every way out (an ISBN, Cancel, Escape, the backdrop, navigation) destroys the dialog.
    inject(DestroyRef).onDestroy(() => this.release());
    afterNextRender(() => void this.start());
  }

  private async start(): Promise<void> {
    if (!this.camera) {
      this.state.set('unsupported');
      return;
    }
    let stream: MediaStream;
    try {
      // A bare facingMode is a preference: a laptop's only (front) camera still opens.
      stream = await this.camera.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
    } catch (error) {
      if (!this.finished) this.state.set(cameraProblem(error));
      return;
    }
    if (this.finished) {
      stopTracks(stream);
      return;
    }
    this.stream = stream;
    const video = this.video()!.nativeElement;
    // The attribute alone does not mute an element made by script, and only muted video may
    // play without a further tap (autoplay policies).
    video.muted = true;
    video.srcObject = stream;
    try {
      await video.play();
      const scan = await startEan13Scan(video, await pickBarcodeEngine(), (rawValue) => this.consider(rawValue));
      if (this.finished) {
        scan.stop();
        return;
      }
      this.scan = scan;
      this.state.set('scanning');
    } catch {
      if (this.finished) return;
      this.release();
      this.state.set('failed');
    }
  }

  private consider(rawValue: string): void {
    if (this.finished) return;
    const reading = readBookBarcode(rawValue);
    if (reading.kind === 'isbn') {
      this.release();
      this.dialog.close(reading.isbn);
    } else if (reading.kind === 'not-a-book') {
      this.notice.set('That barcode is not a book’s ISBN. A book’s starts with 978 or 979, usually on the back cover.');
    }
    // A misread frame says nothing: the next frame usually reads well.
  }

  /** Stops reading frames and turns the camera off (its light too). */
  private release(): void {
    this.finished = true;
    this.scan?.stop();
    this.scan = null;
    if (this.stream) stopTracks(this.stream);
    this.stream = null;
    const video = this.video()?.nativeElement;
    if (video) video.srcObject = null;
  }
}

function stopTracks(stream: MediaStream): void {
  stream.getTracks().forEach((track) => track.stop());
}
