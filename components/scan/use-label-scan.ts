import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { parseDrumLabel, type DrumLabel } from '@/shared/gs1';
import { cameraErrorSentence, liveCameraUnavailable, openRearCamera, stopCamera } from './camera';
import { openCodeReader, type CodeReader, type FrameSource } from './code-reader';
import type { DecodedCode } from './zxing-decode';

/** 'starting' while the camera and decoder open; 'live' with a preview; 'photo' when only a photo can be read; 'failed' when nothing can. */
export type ScanPhase = 'starting' | 'live' | 'photo' | 'failed';

const FRAME_EVERY_MS = 200;
const HINT_AFTER_MS = 8000;
const TYPE_INSTEAD = 'Scan another code, or type the lot number.';

export interface LabelScan {
  phase: ScanPhase;
  /** Why there is no live camera (or why nothing works), in plain words. */
  cameraProblem: string | null;
  /** What is wrong with the last code read or photo taken. */
  codeProblem: string | null;
  /** A nudge when the camera has found no code for a while. */
  hint: string | null;
  engine: CodeReader['engine'] | null;
  readingPhoto: boolean;
  /** Give the preview's video element here (a callback ref). */
  attachVideo: (el: HTMLVideoElement | null) => void;
  readPhoto: (file: File) => Promise<void>;
  stop: () => void;
}

type Found = (label: DrumLabel) => void;

interface Started {
  reader: CodeReader | null;
  stream: MediaStream | null;
  problem: string | null;
}

/** The decoder and the camera, opened side by side; no reader means nothing can be read. */
async function startScan(): Promise<Started> {
  const camera = liveCameraUnavailable();
  const [r, s] = await Promise.allSettled([openCodeReader(), camera ? Promise.reject(new Error(camera)) : openRearCamera()]);
  if (r.status === 'rejected') {
    if (s.status === 'fulfilled') stopCamera(s.value);
    return { reader: null, stream: null, problem: 'The barcode decoder could not be loaded. Check the connection and try again, or type the lot number.' };
  }
  if (s.status === 'fulfilled') return { reader: r.value, stream: s.value, problem: null };
  return { reader: r.value, stream: null, problem: camera ?? cameraErrorSentence(s.reason) };
}

/** The camera, the decoder and the parser for one opening of the scanner; `onFound` gets the first label that reads. */
export function useLabelScan(onFound: Found): LabelScan {
  const [phase, setPhase] = useState<ScanPhase>('starting');
  const [cameraProblem, setCameraProblem] = useState<string | null>(null);
  const [codeProblem, setCodeProblem] = useState<string | null>(null);
  const [hint, setHint] = useState<string | null>(null);
  const [engine, setEngine] = useState<CodeReader['engine'] | null>(null);
  const [readingPhoto, setReadingPhoto] = useState(false);
  const reader = useRef<CodeReader | null>(null);
  const stream = useRef<MediaStream | null>(null);
  const video = useRef<HTMLVideoElement | null>(null);
  const done = useRef(false);
  const found = useRef(onFound);
  useLayoutEffect(() => {
    found.current = onFound;
  });

  const stop = useCallback(() => {
    done.current = true;
    stopCamera(stream.current);
    stream.current = null;
  }, []);

  /** True when one of the codes read as a label (and the scan is over). */
  const take = useCallback(
    (codes: DecodedCode[]): boolean => {
      let problem: string | null = null;
      for (const code of codes) {
        const label = parseDrumLabel(code.text);
        if (label.ok) {
          const { ok: _ok, ...rest } = label;
          stop();
          found.current(rest);
          return true;
        }
        problem ??= label.error;
      }
      if (problem) setCodeProblem(`${problem} ${TYPE_INSTEAD}`);
      return false;
    },
    [stop],
  );

  useEffect(() => {
    // A local flag, not `done`: a re-run of this effect must not adopt the camera an earlier run opened.
    let cancelled = false;
    done.current = false;
    void startScan().then((started) => {
      if (cancelled) {
        stopCamera(started.stream);
        return;
      }
      reader.current = started.reader;
      stream.current = started.stream;
      setEngine(started.reader?.engine ?? null);
      setCameraProblem(started.problem);
      setPhase(!started.reader ? 'failed' : started.stream ? 'live' : 'photo');
    });
    return () => {
      cancelled = true;
      stop();
    };
  }, [stop]);

  // The frame loop: one frame at a time, a fifth of a second apart, while the preview is live.
  useEffect(() => {
    if (phase !== 'live') return;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const started = Date.now();
    const tick = async () => {
      const v = video.current;
      if (done.current) return;
      if (v && reader.current && v.readyState >= 2) {
        try {
          if (take(await reader.current.read(v as FrameSource))) return;
        } catch {
          // A frame the decoder could not take (the stream changing size): the next one will do.
        }
        if (Date.now() - started > HINT_AFTER_MS) setHint('No code found yet: fill the frame with the barcode, hold it flat and steady, and light the label.');
      }
      if (!done.current) timer = setTimeout(tick, FRAME_EVERY_MS);
    };
    timer = setTimeout(tick, 0);
    return () => clearTimeout(timer);
  }, [phase, take]);

  const attachVideo = useCallback((el: HTMLVideoElement | null) => {
    video.current = el;
    if (el && stream.current && el.srcObject !== stream.current) {
      el.srcObject = stream.current;
      el.play().catch(() => undefined); // autoplay of a muted inline video is allowed; a refusal leaves the poster
    }
  }, []);

  const readPhoto = useCallback(
    async (file: File) => {
      if (!reader.current) return;
      setReadingPhoto(true);
      setCodeProblem(null);
      try {
        const bitmap = await createImageBitmap(file).catch(() => null);
        if (!bitmap) {
          setCodeProblem('That file is not a photo this browser can open. Take the photo again, or type the lot number.');
          return;
        }
        const codes = await reader.current.read(bitmap).finally(() => bitmap.close());
        if (codes.length === 0) {
          setCodeProblem('No QR, Data Matrix or Code 128 code was found in the photo. Take it again closer, flat and in good light, or type the lot number.');
          return;
        }
        take(codes);
      } finally {
        setReadingPhoto(false);
      }
    },
    [take],
  );

  return { phase, cameraProblem, codeProblem, hint, engine, readingPhoto, attachVideo, readPhoto, stop };
}
