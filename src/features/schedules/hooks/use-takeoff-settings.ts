// The take-off settings of one project (coats, coverage, waste, m² per box or roll, the option
// counted per room), kept in this browser: they are the designer's working figures, not the project's.
import { useCallback, useEffect, useState } from 'react';
import { z } from 'zod';
import { takeoffSettingsSchema, type TakeoffSettings } from '../../../../shared/analysis/takeoff-settings';

const STORAGE_PREFIX = 'parlour.takeoff.';

const storedSchema = z.object({
  settings: takeoffSettingsSchema.catch(() => takeoffSettingsSchema.parse({})),
  /** The option counted for each room, by room id. */
  counted: z.record(z.string(), z.string()).catch({}),
});
export type StoredTakeoff = z.infer<typeof storedSchema>;

const EMPTY: StoredTakeoff = { settings: takeoffSettingsSchema.parse({}), counted: {} };

function read(projectId: string): StoredTakeoff {
  try {
    const raw = window.localStorage.getItem(STORAGE_PREFIX + projectId);
    return raw ? storedSchema.parse(JSON.parse(raw)) : EMPTY;
  } catch {
    // A value from an older version or edited by hand: start from the defaults rather than fail.
    return EMPTY;
  }
}

export function useTakeoffSettings(projectId: string) {
  const [stored, setStored] = useState<StoredTakeoff>(() => read(projectId));
  useEffect(() => setStored(read(projectId)), [projectId]);

  const update = useCallback(
    (change: (s: StoredTakeoff) => StoredTakeoff) => {
      setStored((current) => {
        const next = change(current);
        try {
          window.localStorage.setItem(STORAGE_PREFIX + projectId, JSON.stringify(next));
        } catch {
          // Storage full or blocked: the settings still hold for this visit.
        }
        return next;
      });
    },
    [projectId],
  );

  const setSettings = useCallback(
    (patch: Partial<TakeoffSettings>) => update((s) => ({ ...s, settings: { ...s.settings, ...patch } })),
    [update],
  );
  const setUnitCoverage = useCallback(
    (finishId: string, m2: number | null) =>
      update((s) => {
        const unitCoverageM2 = { ...s.settings.unitCoverageM2 };
        if (m2 === null) delete unitCoverageM2[finishId];
        else unitCoverageM2[finishId] = m2;
        return { ...s, settings: { ...s.settings, unitCoverageM2 } };
      }),
    [update],
  );
  const setCounted = useCallback(
    (roomId: string, optionId: string) => update((s) => ({ ...s, counted: { ...s.counted, [roomId]: optionId } })),
    [update],
  );
  const reset = useCallback(() => update((s) => ({ ...s, settings: EMPTY.settings })), [update]);

  return { ...stored, setSettings, setUnitCoverage, setCounted, reset };
}
