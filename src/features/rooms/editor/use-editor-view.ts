// How the room editor's screen is arranged, kept apart from what is edited: plan and 3D side by side
// or by turns, where the divider between them sits, and the length unit (remembered in this browser).
import { useCallback, useEffect, useState } from 'react';
import type { LengthUnit } from '../../../../shared/units/length';
import { readUnit, storedUnit, UNIT_KEY } from '../../../lib/length-unit';

export type EditorLayout = 'both' | 'plan' | '3d';

/** Below this window width the plan and the 3D preview share the screen by turns. */
export const WIDE_ENOUGH_FOR_BOTH_PX = 1180;
/** The divider keeps each side at least a fifth of the width. */
export const SPLIT_MIN = 0.2;
export const SPLIT_MAX = 0.8;
/** One arrow-key press moves the divider this share of the width. */
export const SPLIT_KEY_STEP = 0.05;

/** The plan's share of the width, held between SPLIT_MIN and SPLIT_MAX. */
export function clampSplit(share: number): number {
  return Math.min(SPLIT_MAX, Math.max(SPLIT_MIN, share));
}

export { storedUnit };

export function useEditorView() {
  // Side by side needs room; on a tablet the plan starts alone and the 3D is one tap away.
  const [layout, setLayout] = useState<EditorLayout>(() => (window.innerWidth >= WIDE_ENOUGH_FOR_BOTH_PX ? 'both' : 'plan'));
  const [split, setSplitShare] = useState(0.55);
  const [unit, setUnit] = useState<LengthUnit>(readUnit);
  useEffect(() => {
    try {
      localStorage.setItem(UNIT_KEY, unit);
    } catch {
      // Blocked storage only costs choosing the unit again next time.
    }
  }, [unit]);
  const setSplit = useCallback((share: number) => setSplitShare(clampSplit(share)), []);
  const nudgeSplit = useCallback((by: number) => setSplitShare((s) => clampSplit(s + by)), []);
  return { layout, setLayout, split, setSplit, nudgeSplit, unit, setUnit };
}
