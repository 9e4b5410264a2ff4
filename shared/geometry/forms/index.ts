// A piece's form: from its kind, its settings and its box (mm) to the parts drawn in 3D and on the
// plan. Pure and deterministic, so the editor, the client's views and the tests all see the same.
import type { PieceKind, PieceSettings } from '../../schemas/piece-kind';
import { bedForm, cotForm } from './beds';
import {
  floorLampForm,
  mirrorForm,
  pendantLightForm,
  pictureForm,
  plainBlockForm,
  plantForm,
  radiatorForm,
  rugForm,
  tableLampForm,
} from './decor';
import { dishwasherForm, kitchenBaseUnitForm, kitchenWallUnitForm, ovenHousingForm } from './kitchen';
import type { FormBox, FormBuilder, Part } from './parts';
import { armchairForm, benchForm, cornerSofaForm, diningChairForm, ottomanForm, sofaForm, stoolForm } from './seating';
import {
  bookcaseForm,
  chestOfDrawersForm,
  mediaUnitForm,
  openShelvingForm,
  sideboardForm,
  wallCabinetForm,
  wallShelfForm,
  wardrobeForm,
} from './storage';
import { bedsideTableForm, coffeeTableForm, deskForm, diningSetForm, diningTableForm, sideTableForm } from './tables';

export type { FormBox, Part, MaterialSlot, PartRole, PartShape } from './parts';

export const FORMS: Record<PieceKind, FormBuilder> = {
  sofa: sofaForm,
  'corner-sofa': cornerSofaForm,
  armchair: armchairForm,
  'dining-chair': diningChairForm,
  stool: stoolForm,
  bench: benchForm,
  ottoman: ottomanForm,
  'dining-table': diningTableForm,
  'dining-set': diningSetForm,
  'coffee-table': coffeeTableForm,
  'side-table': sideTableForm,
  'bedside-table': bedsideTableForm,
  desk: deskForm,
  bed: bedForm,
  cot: cotForm,
  wardrobe: wardrobeForm,
  'chest-of-drawers': chestOfDrawersForm,
  sideboard: sideboardForm,
  'media-unit': mediaUnitForm,
  'open-shelving': openShelvingForm,
  bookcase: bookcaseForm,
  'wall-shelf': wallShelfForm,
  'wall-cabinet': wallCabinetForm,
  'kitchen-base-unit': kitchenBaseUnitForm,
  'kitchen-wall-unit': kitchenWallUnitForm,
  'oven-housing': ovenHousingForm,
  dishwasher: dishwasherForm,
  rug: rugForm,
  'floor-lamp': floorLampForm,
  'table-lamp': tableLampForm,
  'pendant-light': pendantLightForm,
  mirror: mirrorForm,
  picture: pictureForm,
  plant: plantForm,
  radiator: radiatorForm,
  'plain-block': plainBlockForm,
};

/** Kinds that hang from their top (the box's top is where they are fixed). */
export const HANGING_KINDS: readonly PieceKind[] = ['pendant-light'];

/** The parts of a piece of `kind` filling `box` (piece frame mm, front at +y, z up from the box's underside). */
export function formParts(kind: PieceKind | undefined, settings: PieceSettings | undefined, box: FormBox): Part[] {
  return FORMS[kind ?? 'plain-block'](box, settings ?? {});
}
