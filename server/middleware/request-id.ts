import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';

/** Gives every request an id, echoed in X-Request-Id and in 5xx bodies. */
export const requestId: RequestHandler = (req, res, next) => {
  const incoming = req.get('x-request-id');
  const id = incoming && /^[\w-]{8,64}$/.test(incoming) ? incoming : randomUUID();
  res.locals.requestId = id;
  res.setHeader('X-Request-Id', id);
  next();
};
