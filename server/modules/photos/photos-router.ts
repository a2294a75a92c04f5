import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import {
  castingPhotosParamsSchema,
  markCreateSchema,
  markParamsSchema,
  markUpdateSchema,
  photoListQuerySchema,
  photoParamsSchema,
  photoUpdateSchema,
  photoVariantParamsSchema,
} from '../../../shared/photos/photo-schemas.ts';
import { config } from '../../config.ts';
import { requireMember } from '../../middleware/require-member.ts';
import * as photosService from './photos-service.ts';

export const photosRouter = Router();

// Photos are held in memory only while one request decodes them; the limits
// bound that memory (25 MB × 20 files by default).
const upload: RequestHandler = (req, res, next) =>
  multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: config().uploads.maxBytes, files: config().uploads.maxFiles, fields: 10, parts: config().uploads.maxFiles + 10 },
  }).array('photos', config().uploads.maxFiles)(req, res, next);

photosRouter.post('/workshops/:workshopId/castings/:castingId/photos', requireMember, upload, async (req, res) => {
  const { castingId } = castingPhotosParamsSchema.parse(req.params);
  const files = ((req.files as Express.Multer.File[] | undefined) ?? []).map((f) => ({
    // multer decodes names as latin1; browsers send UTF-8.
    originalName: Buffer.from(f.originalname, 'latin1').toString('utf8'),
    buffer: f.buffer,
  }));
  const results = await photosService.uploadPhotos(res.locals.actor, res.locals.workshopId, castingId, files);
  res.status(results.some((r) => r.status === 'stored') ? 201 : 200).json({ results });
});

photosRouter.get('/workshops/:workshopId/photos', requireMember, async (req, res) => {
  const query = photoListQuerySchema.parse(req.query);
  res.json(await photosService.listPhotos(res.locals.actor, res.locals.workshopId, query));
});

photosRouter.get('/workshops/:workshopId/photo-index', requireMember, async (_req, res) => {
  res.setHeader('Cache-Control', 'private, no-cache');
  res.json({ items: await photosService.photoIndex(res.locals.actor, res.locals.workshopId) });
});

photosRouter.get('/workshops/:workshopId/photos/:photoId', requireMember, async (req, res) => {
  const { photoId } = photoParamsSchema.parse(req.params);
  res.json(await photosService.getPhoto(res.locals.actor, res.locals.workshopId, photoId));
});

photosRouter.patch('/workshops/:workshopId/photos/:photoId', requireMember, async (req, res) => {
  const { photoId } = photoParamsSchema.parse(req.params);
  const values = photoUpdateSchema.parse(req.body);
  res.json(await photosService.updatePhoto(res.locals.actor, res.locals.workshopId, photoId, values));
});

photosRouter.delete('/workshops/:workshopId/photos/:photoId', requireMember, async (req, res) => {
  const { photoId } = photoParamsSchema.parse(req.params);
  await photosService.deletePhoto(res.locals.actor, res.locals.workshopId, photoId);
  res.status(204).end();
});

photosRouter.get('/workshops/:workshopId/photos/:photoId/image/:variant', requireMember, async (req, res) => {
  const { photoId, variant } = photoVariantParamsSchema.parse(req.params);
  const image = await photosService.photoImage(res.locals.actor, res.locals.workshopId, photoId, variant);
  const etag = `"${image.key.split('/').pop()}"`;
  // A photo's objects never change, so the browser may keep them; "private"
  // keeps shared caches from storing images that need a session.
  res.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
  res.setHeader('ETag', etag);
  if (req.get('if-none-match') === etag) {
    image.body.destroy();
    res.status(304).end();
    return;
  }
  res.setHeader('Content-Type', image.contentType);
  if (image.contentLength !== undefined) res.setHeader('Content-Length', String(image.contentLength));
  image.body.on('error', () => res.destroy());
  image.body.pipe(res);
});

photosRouter.get('/workshops/:workshopId/photos/:photoId/marks', requireMember, async (req, res) => {
  const { photoId } = photoParamsSchema.parse(req.params);
  res.json(await photosService.listMarks(res.locals.actor, res.locals.workshopId, photoId));
});

photosRouter.post('/workshops/:workshopId/photos/:photoId/marks', requireMember, async (req, res) => {
  const { photoId } = photoParamsSchema.parse(req.params);
  const input = markCreateSchema.parse(req.body);
  res.status(201).json(await photosService.addMark(res.locals.actor, res.locals.workshopId, photoId, input));
});

photosRouter.patch('/workshops/:workshopId/photos/:photoId/marks/:markId', requireMember, async (req, res) => {
  const { photoId, markId } = markParamsSchema.parse(req.params);
  const input = markUpdateSchema.parse(req.body);
  res.json(await photosService.changeMark(res.locals.actor, res.locals.workshopId, photoId, markId, input));
});

photosRouter.delete('/workshops/:workshopId/photos/:photoId/marks/:markId', requireMember, async (req, res) => {
  const { photoId, markId } = markParamsSchema.parse(req.params);
  await photosService.removeMark(res.locals.actor, res.locals.workshopId, photoId, markId);
  res.status(204).end();
});
