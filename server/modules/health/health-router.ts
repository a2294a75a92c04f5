import { Router } from 'express';
import { sequelize } from '../../db/sequelize.ts';
import { storageReachable } from '../../lib/storage.ts';

export const healthRouter = Router();

/** The process is up; says nothing about its dependencies. */
healthRouter.get('/health', (_req, res) => {
  res.json({ status: 'ok' });
});

/** Ready to serve: the database and the object store both answer. */
healthRouter.get('/ready', async (_req, res) => {
  const [database, storage] = await Promise.all([
    sequelize
      .query('SELECT 1')
      .then(() => true)
      .catch(() => false),
    storageReachable(),
  ]);
  const ready = database && storage;
  res.status(ready ? 200 : 503).json({
    status: ready ? 'ready' : 'unavailable',
    checks: { database: database ? 'ok' : 'unreachable', storage: storage ? 'ok' : 'unreachable' },
  });
});
