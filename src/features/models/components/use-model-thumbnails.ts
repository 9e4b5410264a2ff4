// Draws the missing thumbnails: each ready model without one is rendered once in this browser and
// sent as a PNG (the server keeps it as WebP).
import { useEffect, useRef } from 'react';
import { useSetModelThumbnail, type PieceModel } from '../api/models';
import { renderStill } from './model-three';

/** Renders and sends a thumbnail for each ready model that has none, one at a time. */
export function useModelThumbnails(models: PieceModel[] | undefined, canEdit: boolean) {
  const send = useSetModelThumbnail();
  const tried = useRef(new Set<string>());
  const busy = useRef(false);
  const waiting = canEdit
    ? (models ?? []).filter((m) => m.status === 'ready' && !m.thumbnailUrl && m.modelUrl && !tried.current.has(m.id))
    : [];
  const next = waiting[0];
  useEffect(() => {
    if (!next?.modelUrl || busy.current) return;
    busy.current = true;
    tried.current.add(next.id);
    renderStill(next.modelUrl, next.turnDeg)
      .then((png) => send.mutateAsync({ id: next.id, png }))
      .catch(() => {
        // A model this browser cannot draw keeps its placeholder; its page still opens.
      })
      .finally(() => {
        busy.current = false;
      });
  }, [next?.id]); // eslint-disable-line react-hooks/exhaustive-deps
}
