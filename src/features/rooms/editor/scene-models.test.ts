// The editor's preview draws a ready model on each placed piece that wears one, and the form otherwise.
import { describe, expect, it } from 'vitest';
import { pieceSchema } from '../../../../shared/schemas/option';
import type { PieceModel } from '../../../../shared/schemas/piece-model';
import { sceneModelsFor } from './scene-models';

const model = (id: string, status: PieceModel['status'], turnDeg: PieceModel['turnDeg'] = 0): PieceModel => ({
  id,
  name: id,
  supplier: null,
  link: null,
  price: null,
  kind: null,
  turnDeg,
  scale: 1,
  status,
  failureReason: null,
  fileName: `${id}.glb`,
  size: status === 'ready' ? { widthMm: 2100, depthMm: 900, heightMm: 850 } : null,
  unitHint: null,
  triangles: status === 'ready' ? 1200 : null,
  materials: status === 'ready' ? 2 : null,
  bytes: 1000,
  modelUrl: status === 'ready' ? `/api/files/${id}.glb` : null,
  thumbnailUrl: null,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
});

const piece = (id: string, extra: Record<string, unknown>) =>
  pieceSchema.parse({ id, name: id, x: 1000, y: 1000, width: 2100, depth: 900, height: 850, status: 'new', ...extra });

describe('sceneModelsFor', () => {
  const models = new Map([
    ['sofa', model('sofa', 'ready', 90)],
    ['chair', model('chair', 'processing')],
  ]);
  it('gives placed pieces wearing a ready model its file, turn and whether it wears the finishes', () => {
    const out = sceneModelsFor(
      [
        piece('a', { modelId: 'sofa', modelWearsFinishes: true }),
        piece('b', { modelId: 'sofa' }),
        piece('c', { modelId: 'chair' }),
        piece('d', { modelId: 'gone' }),
        piece('e', { modelId: 'sofa', placed: false }),
        piece('f', {}),
      ],
      models,
    );
    expect([...out.keys()]).toEqual(['a', 'b']);
    expect(out.get('a')).toEqual({ url: '/api/files/sofa.glb', turnDeg: 90, wearsFinishes: true });
    expect(out.get('b')?.wearsFinishes).toBe(false);
  });
});
