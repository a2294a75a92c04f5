// Runs the storage fake on its own: `npm run storage:fake`.
import path from 'node:path';
import { startStorageFake } from './storage-fake.ts';

const port = Number(process.env.STORAGE_FAKE_PORT ?? 4568);
const directory = path.resolve(process.env.STORAGE_FAKE_DIR ?? '.data/storage');
const bucket = process.env.S3_BUCKET ?? 'pourscope';

const handle = await startStorageFake({ directory, port, bucket, silent: false });
console.log(`storage fake: ${handle.endpoint} (bucket ${bucket}, files in ${path.relative(process.cwd(), directory)})`);
const stop = () => void handle.stop().then(() => process.exit(0));
process.once('SIGINT', stop);
process.once('SIGTERM', stop);
