// Reading a model upload: one .glb or .gltf per request (the page sends each file in its own request,
// with its own progress), held in memory within the size limit, then the bounded first look. And the
// still thumbnail the browser renders after upload: one PNG, re-encoded by sharp as WebP.
import type { Request, Response } from 'express';
import multer from 'multer';
import sharp from 'sharp';
import { MODEL_LIMITS } from '../../../shared/schemas/piece-model';
import { HttpError } from '../../http/errors';
import { checkModelFile, ModelProblem, type ModelHeader } from '../../services/gltf/check-gltf';

export const MODEL_FIELD = 'model';
export const THUMBNAIL_FIELD = 'thumbnail';
const MB = 1024 * 1024;
/** A thumbnail is a small still: 2 MB and 4 megapixels are far more than one needs (common practice). */
export const THUMBNAIL_LIMITS = { bytes: 2 * MB, pixels: 4_000_000, sidePx: 320 } as const;
export const MODEL_TOO_LARGE = `The model is larger than ${MODEL_LIMITS.maxFileBytes / MB} MB. Export a lighter version and try again.`;
export const THUMBNAIL_TOO_LARGE = `The thumbnail is larger than ${THUMBNAIL_LIMITS.bytes / MB} MB.`;

const single = (field: string, bytes: number) =>
  multer({
    storage: multer.memoryStorage(),
    defParamCharset: 'utf8',
    limits: { fileSize: bytes, files: 1, fields: 10, fieldSize: 1024, parts: 12 },
  }).single(field);

const modelUpload = single(MODEL_FIELD, MODEL_LIMITS.maxFileBytes);
const thumbnailUpload = single(THUMBNAIL_FIELD, THUMBNAIL_LIMITS.bytes);

function multerProblem(err: multer.MulterError, field: string, tooLarge: string): HttpError {
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new HttpError(413, 'file_too_large', tooLarge);
    case 'LIMIT_FILE_COUNT':
    case 'LIMIT_UNEXPECTED_FILE':
      return err.field && err.field !== field
        ? new HttpError(400, 'invalid', `Send the file in the “${field}” field.`)
        : new HttpError(400, 'too_many_files', 'Send one file per upload.');
    default:
      return new HttpError(400, 'bad_upload', 'The upload could not be read. Try again.');
  }
}

async function readSingle(req: Request, res: Response, handler: ReturnType<typeof single>, field: string, tooLarge: string) {
  await new Promise<void>((resolve, reject) => {
    handler(req, res, (err: unknown) => {
      if (!err) resolve();
      else if (err instanceof multer.MulterError) reject(multerProblem(err, field, tooLarge));
      else reject(new HttpError(400, 'bad_upload', 'The upload was cut off or is not a form upload. Try again.'));
    });
  });
  return req.file;
}

export interface UploadedModel {
  fileName: string;
  buffer: Buffer;
  header: ModelHeader;
}

/** The request's model, checked; throws HttpError with the reason for anything else. */
export async function readModelUpload(
  req: Request,
  res: Response,
): Promise<{ model: UploadedModel; fields: Record<string, unknown> }> {
  const file = await readSingle(req, res, modelUpload, MODEL_FIELD, MODEL_TOO_LARGE);
  if (!file)
    throw new HttpError(400, 'no_model', 'Choose a model file (.glb or .gltf).', { [MODEL_FIELD]: 'Choose a model file.' });
  try {
    const header = await checkModelFile(file.buffer);
    return {
      model: { fileName: file.originalname, buffer: file.buffer, header },
      fields: (req.body ?? {}) as Record<string, unknown>,
    };
  } catch (err) {
    if (err instanceof ModelProblem) throw new HttpError(err.status, err.code, err.message, { [MODEL_FIELD]: err.message });
    throw err;
  }
}

/** The request's thumbnail as a WebP of at most 320 px a side; refuses what is not a small PNG. */
export async function readThumbnailUpload(req: Request, res: Response): Promise<Buffer> {
  const file = await readSingle(req, res, thumbnailUpload, THUMBNAIL_FIELD, THUMBNAIL_TOO_LARGE);
  if (!file) throw new HttpError(400, 'no_thumbnail', 'Send the thumbnail as a PNG.');
  const png = file.buffer.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  if (!png) throw new HttpError(415, 'not_png', 'Send the thumbnail as a PNG.');
  try {
    return await sharp(file.buffer, { limitInputPixels: THUMBNAIL_LIMITS.pixels, failOn: 'warning' })
      .resize(THUMBNAIL_LIMITS.sidePx, THUMBNAIL_LIMITS.sidePx, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 82 })
      .toBuffer();
  } catch {
    throw new HttpError(422, 'bad_thumbnail', 'The thumbnail could not be read (a damaged or very large PNG).');
  }
}
