import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Env } from '../config/env';
import type { Db } from '../db/tables';
import { HttpError, badRequest } from '../http/http-error';
import { validate } from '../http/validate';
import { MAX_PHOTO_BYTES } from './photo-cleaning';
import { PhotoStore, photosDir } from './photo-store';
import { SpoilPhotosService } from './spoil-photos-service';

const eventParams = z.object({ eventId: z.uuid('A spoil photo address holds the spoil event\'s UUID.') });

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 5 } }).single('photo');

/** Runs multer and turns its errors into sentences (multer's own would become a 500). */
function receivePhoto(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        return reject(new HttpError(413, `The photo is larger than ${MAX_PHOTO_BYTES / (1024 * 1024)} MB. Take it again at a lower resolution.`));
      }
      reject(badRequest('The upload was not understood. Send one image in the multipart field "photo".'));
    });
  });
}

/** /api/spoils/:eventId/photo: a spoil's photo, sent once per event by the tablet and shown to owner and lead. */
export function photosRouter(db: Db, env: Env): Router {
  const router = Router();
  const photos = new SpoilPhotosService(db, new PhotoStore(photosDir(env.UPLOADS_DIR)));
  const viewers = allowRoles('owner', 'lead');

  router.post('/:eventId/photo', allowRoles('operator', 'lead'), async (req, res) => {
    const { eventId } = validate(eventParams, req.params, 'spoil photo address');
    await receivePhoto(req, res);
    if (!req.file) throw badRequest('No photo was attached. Send the image in the multipart field "photo".');
    const { photo, created } = await photos.store(eventId, req.file.buffer);
    // A retry of a photo already stored is answered like the first success, so the tablet stops.
    res.status(created ? 201 : 200).json(photo);
  });

  router.get('/:eventId/photo', viewers, async (req, res) => {
    const { eventId } = validate(eventParams, req.params, 'spoil photo address');
    const file = await photos.file(eventId, 'photo');
    res.set('X-Content-Type-Options', 'nosniff').type(file.mime).sendFile(file.path);
  });

  router.get('/:eventId/photo/thumb', viewers, async (req, res) => {
    const { eventId } = validate(eventParams, req.params, 'spoil photo address');
    const file = await photos.file(eventId, 'thumb');
    res.set('X-Content-Type-Options', 'nosniff').type(file.mime).sendFile(file.path);
  });

  return router;
}
