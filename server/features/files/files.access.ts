// Who may load a stored file: signed-in members of a studio that owns a finish or model using it,
// and a presentation's visitor for the textures of the finishes and the models its shown options use. The files
// routes keep one question each to ask; the queries are in files.repository.ts.
import type { Db } from '../../db/database';
import type { Caller } from '../../http/routes';
import { isDerivedFileOfStudio, isTextureOfFinishes } from './files.repository';
import { isFileOfStudioModels, isModelFileOf } from '../models/models.repository';

export async function canReadFile(db: Db, caller: Caller | null, fileKey: string): Promise<boolean> {
  if (!caller) return false;
  // The kept original is private even to the studio: only what processing made is served.
  if (fileKey.endsWith('.glb')) return isFileOfStudioModels(db, caller.studioId, fileKey);
  return (await isDerivedFileOfStudio(db, caller.studioId, fileKey)) || isFileOfStudioModels(db, caller.studioId, fileKey);
}

/** What a link's visitor sees of a studio's files: the textures of these finishes and these models only. */
export interface PresentationFileScope {
  studioId: string;
  /** Finishes worn by the presentation's shown options. */
  finishIds: readonly string[];
  /** Piece models worn by the presentation's shown options. */
  modelIds: readonly string[];
}

/**
 * True when `fileKey` is a texture of one of the scope's finishes or the file of one of its models. Swatches, previews and the
 * cropping view are the designer's working files: the client's 3D view needs textures alone.
 */
export async function canPresentationReadFile(db: Db, scope: PresentationFileScope, fileKey: string): Promise<boolean> {
  if (fileKey.endsWith('.glb')) return isModelFileOf(db, scope.studioId, scope.modelIds, fileKey);
  return isTextureOfFinishes(db, scope.studioId, scope.finishIds, fileKey);
}
