// The phone's camera for the label scanner (web target: getUserMedia). Loaded with the scanner only.

/** Browsers open the camera only on a secure origin: https, or http://localhost / 127.0.0.1. */
export const INSECURE_SENTENCE =
  'This page is on a plain http address, and browsers open the camera only on a secure one (https, or localhost on this device). ' +
  'Take a photo of the label instead: the photo is read the same way.';

/** Null when a live camera can be asked for here, else the sentence that says why not. */
export function liveCameraUnavailable(): string | null {
  if (typeof window === 'undefined') return 'The camera is only reachable from the web app.';
  if (!window.isSecureContext) return INSECURE_SENTENCE;
  if (!navigator.mediaDevices?.getUserMedia) return 'This browser cannot open the camera. Take a photo of the label instead.';
  return null;
}

/** The rear camera where there is one (a phone), any camera otherwise (a laptop). */
export function openRearCamera(): Promise<MediaStream> {
  return navigator.mediaDevices.getUserMedia({
    audio: false,
    video: { facingMode: { ideal: 'environment' }, width: { ideal: 1280 }, height: { ideal: 720 } },
  });
}

export function stopCamera(stream: MediaStream | null): void {
  stream?.getTracks().forEach((t) => t.stop());
}

/** What went wrong opening the camera, in words for the clerk, with the way on. */
export function cameraErrorSentence(err: unknown): string {
  const name = err instanceof Error || (typeof DOMException !== 'undefined' && err instanceof DOMException) ? (err as Error).name : '';
  switch (name) {
    case 'NotAllowedError':
    case 'SecurityError':
      return 'The camera was not allowed. Allow it for this site in the browser’s settings, or take a photo of the label instead.';
    case 'NotFoundError':
    case 'OverconstrainedError':
      return 'No camera was found on this device. Take a photo of the label instead, or type the lot number.';
    case 'NotReadableError':
    case 'AbortError':
      return 'The camera is in use by another app. Close it and try again, or take a photo of the label instead.';
    default:
      return 'The camera could not be opened. Take a photo of the label instead, or type the lot number.';
  }
}
