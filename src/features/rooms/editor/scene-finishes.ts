// What the editor's 3D preview draws the option's surfaces and pieces in.
import type { Finish } from '../../../../shared/schemas/finish';
import type { OptionDoc } from '../../../../shared/schemas/option';
import { optionSurfaces } from '../../../../shared/finishes/option-surfaces';
import type { SurfaceFinishes } from '../../../scene/room-view';

/** What an option's surfaces and placed pieces wear in 3D, from its finish ids and the studio's finishes. */
export function sceneFinishesFor(
  doc: OptionDoc | undefined,
  finishes: ReadonlyMap<string, Finish>,
  size: 'standard' | 'large' = 'standard',
): SurfaceFinishes {
  return doc ? optionSurfaces(doc, finishes, { size }) : {};
}
