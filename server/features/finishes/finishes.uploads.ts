// Reading a photo upload: multipart through multer (held in memory, within the limits), then a
// first look at each file. Nothing is stored until every file of the request has passed.
import type { Request, Response } from 'express';
import multer from 'multer';
import { UPLOAD_LIMITS } from '../../../shared/schemas/finish';
import { HttpError } from '../../http/errors';
import { inspectPhoto, PhotoProblem, type PhotoHeader } from '../../services/images/inspect';

export const PHOTOS_FIELD = 'photos';
const MB = 1024 * 1024;

/** The most one photo request can carry: every file at the size limit. */
export const PHOTO_UPLOAD_CEILING = UPLOAD_LIMITS.maxFileBytes * UPLOAD_LIMITS.maxFilesPerRequest;
export const PHOTO_UPLOAD_TOO_LARGE = `The upload is larger than ${PHOTO_UPLOAD_CEILING / MB} MB: send at most ${UPLOAD_LIMITS.maxFilesPerRequest} photos of up to ${UPLOAD_LIMITS.maxFileBytes / MB} MB each at a time.`;

const upload = multer({
  storage: multer.memoryStorage(),
  defParamCharset: 'utf8',
  limits: {
    fileSize: UPLOAD_LIMITS.maxFileBytes,
    files: UPLOAD_LIMITS.maxFilesPerRequest,
    fields: 10,
    fieldSize: 1024,
    parts: UPLOAD_LIMITS.maxFilesPerRequest + 10,
  },
}).array(PHOTOS_FIELD, UPLOAD_LIMITS.maxFilesPerRequest);

function multerProblem(err: multer.MulterError): HttpError {
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new HttpError(
        413,
        'file_too_large',
        `A photo is larger than ${UPLOAD_LIMITS.maxFileBytes / MB} MB. Export it smaller and try again.`,
      );
    case 'LIMIT_FILE_COUNT':
    case 'LIMIT_UNEXPECTED_FILE':
      return err.field && err.field !== PHOTOS_FIELD
        ? new HttpError(400, 'invalid', `Send photos in the “${PHOTOS_FIELD}” field.`)
        : new HttpError(400, 'too_many_files', `Upload at most ${UPLOAD_LIMITS.maxFilesPerRequest} photos at a time.`);
    default:
      return new HttpError(400, 'bad_upload', 'The upload could not be read. Try again.');
  }
}

export interface UploadedPhoto {
  fileName: string;
  buffer: Buffer;
  header: PhotoHeader;
}

/** The request's photos and text fields, each photo inspected; throws HttpError for any problem. */
export async function readPhotoUpload(
  req: Request,
  res: Response,
): Promise<{ photos: UploadedPhoto[]; fields: Record<string, unknown> }> {
  await new Promise<void>((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) resolve();
      else if (err instanceof multer.MulterError) reject(multerProblem(err));
      else reject(new HttpError(400, 'bad_upload', 'The upload was cut off or is not a form upload. Try again.'));
    });
  });
  const files = (Array.isArray(req.files) ? req.files : []) as Express.Multer.File[];
  if (files.length === 0) {
    throw new HttpError(400, 'no_photos', 'Choose at least one photo (JPEG, PNG or WebP).', {
      [PHOTOS_FIELD]: 'Choose at least one photo.',
    });
  }
  const photos: UploadedPhoto[] = [];
  for (const [i, file] of files.entries()) {
    try {
      photos.push({
        fileName: file.originalname,
        buffer: file.buffer,
        header: await inspectPhoto(file.buffer, file.originalname),
      });
    } catch (err) {
      if (err instanceof PhotoProblem)
        throw new HttpError(err.status, err.code, err.message, { [`${PHOTOS_FIELD}[${i}]`]: err.message });
      throw err;
    }
  }
  return { photos, fields: (req.body ?? {}) as Record<string, unknown> };
}
