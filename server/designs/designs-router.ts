import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Env } from '../config/env';
import { HttpError, badRequest, notFound } from '../http/http-error';
import { validate } from '../http/validate';
import { MAX_DESIGN_BYTES, acceptDesign } from './design-intake';
import { DESIGN_FILE_PATTERN, DesignStore, designsDir } from './design-store';

const fileParams = z.object({
  file: z.string().regex(DESIGN_FILE_PATTERN, 'A design file name is 32 letters and digits and .svg or .png.'),
});

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_DESIGN_BYTES, files: 1, fields: 5 } }).single('design');

/** Runs multer and turns its errors into sentences (multer's own would become a 500). */
function receiveFile(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return reject(new HttpError(413, `The design is larger than ${MAX_DESIGN_BYTES / (1024 * 1024)} MB. Simplify it or export it smaller.`));
        }
        return reject(badRequest(`The upload was not understood (${err.message}). Send one file in the field "design".`));
      }
      reject(badRequest('The upload was not understood. Send one file in the field "design".'));
    });
  });
}

/** /api/designs: upload a design (SVG or PNG) and fetch a stored one. */
export function designsRouter(env: Env): Router {
  const router = Router();
  const store = new DesignStore(designsDir(env.UPLOADS_DIR));

  router.post('/', allowRoles('owner', 'lead'), async (req, res) => {
    await receiveFile(req, res);
    if (!req.file) throw badRequest('No design was attached. Send the file in the multipart field "design".');
    res.status(201).json(await acceptDesign(req.file.buffer, store));
  });

  router.get('/:file', allowRoles('owner', 'lead', 'operator'), async (req, res) => {
    const { file } = validate(fileParams, req.params, 'design address');
    const full = await store.pathOf(file);
    if (!full) throw notFound(`There is no design ${file}. Upload it again on the job.`);
    // Even a sanitised SVG is shown with nothing allowed to run or load.
    res.set('Content-Security-Policy', "default-src 'none'; style-src 'unsafe-inline'");
    res.set('X-Content-Type-Options', 'nosniff');
    res.type(file.endsWith('.svg') ? 'image/svg+xml' : 'image/png');
    res.sendFile(full);
  });

  return router;
}
