// Where the designer was in a room's editor: the step, the option and the walkway width they
// checked with, remembered per room in this browser so a reload reopens the same place.
import { useEffect, useState } from 'react';
import { z } from 'zod';
import { DEFAULT_WALKWAY_MM, MAX_WALKWAY_MM, MIN_WALKWAY_MM } from '../../../../shared/analysis/fit/clearances';
import { EDITOR_STEPS, type EditorStep } from './steps';

const placeKey = (roomId: string) => `parlour:editor-place:${roomId}`;

const stepIds = EDITOR_STEPS.map((s) => s.id) as [EditorStep, ...EditorStep[]];

/** What is stored; each field is dropped on its own when it no longer makes sense. */
const storedPlaceSchema = z.object({
  step: z.enum(stepIds).optional().catch(undefined),
  optionId: z.string().optional().catch(undefined),
  walkwayMm: z.number().min(MIN_WALKWAY_MM).max(MAX_WALKWAY_MM).optional().catch(undefined),
});
export type StoredPlace = z.infer<typeof storedPlaceSchema>;

/** The stored place read back, or null when nothing (or something unreadable) is stored. */
export function parsePlace(raw: string | null): StoredPlace | null {
  if (raw === null) return null;
  try {
    const parsed = storedPlaceSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** Where the editor opens: the stored place where it still applies, else the first step for the designer's role and the first option. */
export function openingPlace(
  stored: StoredPlace | null,
  optionIds: readonly string[],
  readOnly: boolean,
): { step: EditorStep; optionId: string; walkwayMm: number } {
  return {
    step: stored?.step ?? (readOnly ? 'furnish' : 'outline'),
    optionId: stored?.optionId && optionIds.includes(stored.optionId) ? stored.optionId : (optionIds[0] ?? ''),
    walkwayMm: stored?.walkwayMm ?? DEFAULT_WALKWAY_MM,
  };
}

function readPlace(roomId: string): StoredPlace | null {
  try {
    return parsePlace(localStorage.getItem(placeKey(roomId)));
  } catch {
    return null;
  }
}

export function useEditorPlace(roomId: string, optionIds: readonly string[], readOnly: boolean) {
  const [opening] = useState(() => openingPlace(readPlace(roomId), optionIds, readOnly));
  const [step, setStep] = useState<EditorStep>(opening.step);
  const [optionId, setOptionId] = useState(opening.optionId);
  const [walkwayMm, setWalkwayMm] = useState(opening.walkwayMm);
  useEffect(() => {
    try {
      localStorage.setItem(placeKey(roomId), JSON.stringify({ step, optionId, walkwayMm }));
    } catch {
      // Blocked storage only costs reopening on the first step.
    }
  }, [roomId, step, optionId, walkwayMm]);
  return { step, setStep, optionId, setOptionId, walkwayMm, setWalkwayMm };
}
