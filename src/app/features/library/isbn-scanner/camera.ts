import { InjectionToken } from '@angular/core';

/** The part of `navigator.mediaDevices` the scanner uses. */
export type Camera = Pick<MediaDevices, 'getUserMedia'>;

/**
 * This device's cameras, or null where the browser offers none: `navigator.mediaDevices` is
 * `[SecureContext]` in W3C Media Capture and Streams, so it is missing over plain http (other
 * than localhost) and in old browsers. Specs provide a fake.
 */
export const CAMERA = new InjectionToken<Camera | null>('CAMERA', {
  providedIn: 'root',
  factory: () => (typeof navigator.mediaDevices?.getUserMedia === 'function' ? navigator.mediaDevices : null),
});

/** Why the camera cannot be used, in the reader's terms. */
export type CameraProblem = 'unsupported' | 'denied' | 'no-camera' | 'failed';

/**
 * Sorts a `getUserMedia` failure by its DOMException name (W3C Media Capture and Streams): the
 * reader or a policy refused, there is no camera that fits, or the camera is there but would
 * not start (often because another app is using it).
 */
export function cameraProblem(error: unknown): CameraProblem {
  const name = error instanceof DOMException || error instanceof Error ? error.name : '';
  if (name === 'NotAllowedError' || name === 'SecurityError') return 'denied';
  if (name === 'NotFoundError' || name === 'OverconstrainedError') return 'no-camera';
  if (name === 'TypeError' || name === 'NotSupportedError') return 'unsupported';
  return 'failed';
}
