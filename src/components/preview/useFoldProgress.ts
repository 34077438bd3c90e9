import { useCallback, useState } from 'react';

export interface FoldProgress {
  /** 0 (flat sheet) … 100 (folded part), whole percent. */
  foldPercent: number;
  setFoldPercent(percent: number): void;
  /** 0-based index of the current assembly step. */
  stepIndex: number;
  stepPrevious(): void;
  stepNext(): void;
  stepGo(index: number): void;
  /** Whether the slider folds every piece (true) or only the current step's, the rest staying assembled. */
  foldWholeKit: boolean;
  setFoldWholeKit(whole: boolean): void;
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** The fold slider's percent and the current assembly step of `stepCount`, both clamped to their range. */
export default function useFoldProgress(stepCount: number, initialFoldPercent = 100): FoldProgress {
  const [foldPercent, setRaw] = useState(() => clamp(Math.round(initialFoldPercent), 0, 100));
  const [stepIndex, setStepIndex] = useState(0);
  const [foldWholeKit, setFoldWholeKit] = useState(false);
  const last = Math.max(0, stepCount - 1);
  const setFoldPercent = useCallback((p: number) => setRaw(clamp(Math.round(Number.isFinite(p) ? p : 0), 0, 100)), []);
  const stepGo = useCallback((i: number) => setStepIndex(clamp(i, 0, last)), [last]);
  const stepPrevious = useCallback(() => setStepIndex((i) => clamp(i - 1, 0, last)), [last]);
  const stepNext = useCallback(() => setStepIndex((i) => clamp(i + 1, 0, last)), [last]);
  return { foldPercent, setFoldPercent, stepIndex, stepPrevious, stepNext, stepGo, foldWholeKit, setFoldWholeKit };
}
