// `npm run bench`: figures, not tests. Starts throwaway services, seeds a
// large workshop by SQL, and measures each target beside a floor taken in
// the same run on this machine. Prints one table; writes it as JSON too.
//   npm run bench               everything
//   npm run bench -- gallery    one part: gallery | upload | diagnose | client | search
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { monitorEventLoopDelay, performance } from 'node:perf_hooks';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import pg from 'pg';
import sharp from 'sharp';
import { freePort } from './services/free-port.ts';
import { runNode, spawnNode, TSX, VITE } from './services/run-node.ts';
import { startStack } from './services/stack.ts';

const only = new Set(process.argv.slice(2));
const wants = (part: string) => only.size === 0 || only.has(part);

type Row = { part: string; measure: string; value: string; floor: string; target: string; met: boolean | null };
const rows: Row[] = [];
const ms = (n: number) => `${n.toFixed(n < 10 ? 2 : 0)} ms`;
const log = (line: string) => console.log(`› ${line}`);
const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

const root = mkdtempSync(path.join(tmpdir(), 'pourscope-bench-'));
const appPort = await freePort();
const stack = await startStack({ dataRoot: root, throwaway: true, appPort, log });
const env: Record<string, string> = { ...stack.env, NODE_ENV: 'production', LOG_LEVEL: 'warn', AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', COOKIE_SECURE: 'false' };
Object.assign(process.env, env);
const children: ReturnType<typeof spawnNode>[] = [];

async function stopAll() {
  for (const c of children) if (c.exitCode === null) c.kill('SIGTERM');
  await stack.stop();
  rmSync(root, { recursive: true, force: true });
}

try {
  if ((await runNode(TSX, ['scripts/prepare-database.ts', '--no-seed'], { env })) !== 0) throw new Error('migrations failed');
  const db = new pg.Pool({ connectionString: env.DATABASE_URL, max: 4 });
  db.on('error', () => {});

  // ---- a large workshop, by SQL ---------------------------------------------
  log('seeding a large workshop: 20,000 heats, 100,000 photos, 200,000 marks');
  const seedStarted = performance.now();
  const { hashPassword } = await import('../server/lib/password.ts');
  const password = 'bench-password-2026';
  const passwordHash = await hashPassword(password, 12);
  const [{ id: userId }] = (
    await db.query(
      `INSERT INTO users (id, email, password_hash, display_name, created_at, updated_at)
       VALUES (gen_random_uuid(), 'bench@example.test', $1, 'Bench Admin', now(), now()) RETURNING id`,
      [passwordHash],
    )
  ).rows;
  const [{ id: workshopId }] = (
    await db.query(`INSERT INTO workshops (id, name, kind, created_by, created_at, updated_at) VALUES (gen_random_uuid(), 'Bench foundry', 'foundry', $1, now(), now()) RETURNING id`, [userId])
  ).rows;
  await db.query(`INSERT INTO memberships (id, workshop_id, user_id, role, created_at, updated_at) VALUES (gen_random_uuid(), $1, $2, 'admin', now(), now())`, [workshopId, userId]);
  await db.query(`INSERT INTO moulds (id, workshop_id, name, material, created_at, updated_at)
                  SELECT gen_random_uuid(), $1, 'Mould ' || g, (ARRAY['graphite','steel','green_sand','plaster'])[1 + g % 4], now(), now() FROM generate_series(1, 8) g`, [workshopId]);
  await db.query(
    `INSERT INTO heats (id, workshop_id, caster_id, poured_at, alloy, pour_temp_c, degassing, flux_kind, crucible_shock,
                        safety_dry_tools, safety_ppe, safety_clear_floor, created_at, updated_at)
     SELECT gen_random_uuid(), $1, $2, now() - (g || ' hours')::interval, (ARRAY['A356.0','413.0','C90300','Zamak 3'])[1 + g % 4],
            680 + (g % 120), 'none', 'none', 'none', true, true, true, now(), now()
       FROM generate_series(1, 20000) g`,
    [workshopId, userId],
  );
  await db.query(
    `INSERT INTO castings (id, workshop_id, heat_id, position, mould_id, mass_g, quench_medium, created_at, updated_at)
     SELECT gen_random_uuid(), h.workshop_id, h.id, 0, (SELECT id FROM moulds WHERE workshop_id = $1 ORDER BY name LIMIT 1 OFFSET (abs(hashtext(h.id::text)) % 8)), 900, 'none', now(), now()
       FROM heats h WHERE h.workshop_id = $1`,
    [workshopId],
  );
  await db.query(
    `INSERT INTO photos (id, workshop_id, casting_id, uploaded_by, sha256, title, source_format, original_content_type,
                         original_key, original_width, original_height, original_bytes,
                         display_key, display_width, display_height, display_bytes,
                         thumb_key, thumb_width, thumb_height, thumb_bytes, created_at, updated_at)
     SELECT gen_random_uuid(), $1, c.id, $2, md5(c.id::text || k), 'Ingot ' || k, 'jpeg', 'image/jpeg',
            'bench/' || c.id || '/' || k || '-o.jpg', 4000, 3000, 2400000,
            'bench/' || c.id || '/' || k || '-d.jpg', 1600, 1200, 300000,
            'bench/' || c.id || '/' || k || '-t.webp', 400, 300, 20000,
            now() - ((row_number() OVER ()) || ' minutes')::interval, now()
       FROM castings c CROSS JOIN generate_series(1, 5) k WHERE c.workshop_id = $1`,
    [workshopId, userId],
  );
  await db.query(
    `INSERT INTO marks (id, workshop_id, photo_id, author_id, defect_kind, severity, shape, x, y, created_at, updated_at)
     SELECT gen_random_uuid(), $1, p.id, $2,
            (ARRAY['gas_porosity','pinholes','shrinkage_sink','cold_shut','rounded_edges','dross_inclusions','hot_tear','misrun'])[1 + (abs(hashtext(p.id::text || k)) % 8)],
            1 + k % 3, 'point', 0.5, 0.5, now(), now()
       FROM photos p CROSS JOIN generate_series(1, 2) k WHERE p.workshop_id = $1`,
    [workshopId, userId],
  );
  await db.query('ANALYZE');
  const counts = (await db.query(`SELECT (SELECT count(*) FROM heats) h, (SELECT count(*) FROM photos) p, (SELECT count(*) FROM marks) m`)).rows[0];
  log(`seeded ${counts.h} heats, ${counts.p} photos, ${counts.m} marks in ${((performance.now() - seedStarted) / 1000).toFixed(1)} s`);

  if (only.has('explain')) {
    const { listPhotosQuery } = await import('../server/modules/photos/photos-repository.ts');
    for (const kind of [undefined, 'gas_porosity']) {
      const { sql, bind } = listPhotosQuery(workshopId, { limit: 41, kind } as never, null);
      const plan = await db.query(`EXPLAIN (ANALYZE, BUFFERS) ${sql}`, bind);
      console.log(plan.rows.map((r) => r['QUERY PLAN']).join('\n'));
    }
  }

  // ---- the app, signed in ---------------------------------------------------
  if (wants('gallery') || wants('upload') || wants('client')) {
    if (wants('client') && (await runNode(VITE, ['build', '--logLevel', 'warn'], { env })) !== 0) throw new Error('client build failed');
    // Loaded with --import (not tsx's CLI, which forks) so app.pid is the server itself.
    const app = spawnNode('--import', ['tsx', 'server/index.ts'], { env: { ...env, PORT: String(appPort) } });
    children.push(app);
    const base = `http://127.0.0.1:${appPort}`;
    for (let i = 0; !(await fetch(`${base}/api/ready`).then((r) => r.ok).catch(() => false)); i++) {
      if (i > 120) throw new Error('the app did not start');
      await new Promise((r) => setTimeout(r, 250));
    }
    const me = await fetch(`${base}/api/auth/me`);
    const cookie0 = me.headers.get('set-cookie')!.split(';')[0];
    const { csrfToken } = (await me.json()) as { csrfToken: string };
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie: cookie0, 'x-csrf-token': csrfToken },
      body: JSON.stringify({ email: 'bench@example.test', password }),
    });
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    const session = (await signIn.json()) as { csrfToken: string };

    // ---- gallery list and filtered search, beside a bare floor ---------------
    if (wants('gallery')) {
      const { listPhotosQuery, MARKS_OF_SQL } = await import('../server/modules/photos/photos-repository.ts');
      const floorPool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 10 });
      const floorPort = await freePort();
      // The same two statements the API runs, with no framework, session or validation.
      const floor = http.createServer((req, res) => {
        void (async () => {
          const kind = new URL(req.url!, 'http://x').searchParams.get('kind') ?? undefined;
          const { sql, bind } = listPhotosQuery(workshopId, { limit: 41, kind } as never, null);
          const photos = (await floorPool.query(sql, bind)).rows;
          const marks = (await floorPool.query(MARKS_OF_SQL, [photos.slice(0, 40).map((p) => p.id)])).rows;
          res.setHeader('content-type', 'application/json');
          res.end(JSON.stringify({ items: photos.slice(0, 40), marks }));
        })().catch(() => res.destroy());
      });
      await new Promise<void>((r) => floor.listen(floorPort, '127.0.0.1', r));
      const run = (url: string, headers: Record<string, string> = {}) =>
        autocannon({ url, connections: 50, duration: 20, headers });
      for (const [label, query] of [
        ['gallery list', ''],
        ['gallery filtered (kind)', 'kind=gas_porosity'],
      ] as const) {
        log(`${label}: 50 connections × 20 s against the API, then the floor`);
        const api = await run(`${base}/api/workshops/${workshopId}/photos?limit=40&${query}`, { cookie });
        const bare = await run(`http://127.0.0.1:${floorPort}/?${query}`);
        const non2xx = api.non2xx + api.errors;
        rows.push({
          part: label,
          // autocannon reports p97.5, not p95: the stricter figure stands in for it.
          measure: 'p50 / p97.5 / p99 latency',
          value: `${api.latency.p50} / ${api.latency.p97_5} / ${api.latency.p99} ms`,
          floor: `${bare.latency.p50} / ${bare.latency.p97_5} / ${bare.latency.p99} ms`,
          target: 'p95 (p97.5) ≤ 30 ms and ≤ 2 × floor',
          met: api.latency.p97_5 <= 30 && api.latency.p97_5 <= 2 * bare.latency.p97_5,
        });
        rows.push({
          part: label,
          measure: 'requests/s',
          value: `${api.requests.average.toFixed(0)}${non2xx ? ` (${non2xx} not 2xx)` : ''}`,
          floor: bare.requests.average.toFixed(0),
          target: '≥ ½ floor',
          met: api.requests.average >= bare.requests.average / 2 && non2xx === 0,
        });
      }
      floor.closeAllConnections();
      await new Promise((r) => floor.close(r));
      await floorPool.end();
    }

    // ---- photo upload, beside sharp alone ------------------------------------
    if (wants('upload')) {
      log('upload: 12-megapixel JPEGs, landscape and EXIF-rotated portrait');
      // A drawn ingot at phone resolution, with a little sensor noise on top.
      const { drawPiecePhoto } = await import('../seeders/photo-generator.ts');
      const drawn = await drawPiecePhoto({ seed: 3, shape: 'bar-ingot', defects: [{ kind: 'gas_porosity', severity: 2 }] });
      const grain = await sharp({ create: { width: 4000, height: 3000, channels: 3, background: '#808080', noise: { type: 'gaussian', mean: 128, sigma: 6 } } })
        .png()
        .toBuffer();
      const noise = await sharp(drawn.jpeg).resize(4000, 3000).composite([{ input: grain, blend: 'soft-light' }]).jpeg({ quality: 90 }).toBuffer();
      const portrait = await sharp(noise).withMetadata({ orientation: 6 }).jpeg({ quality: 90 }).toBuffer();
      const { processImage } = await import('../server/modules/photos/image-pipeline.ts');
      const [heatRow] = (await db.query('SELECT id FROM castings WHERE workshop_id = $1 LIMIT 1', [workshopId])).rows;
      const castingId = heatRow.id as string;
      const upload = async (body: Buffer, n: number) => {
        const form = new FormData();
        // A unique byte per upload keeps the duplicate check from short-cutting it.
        const unique = Buffer.concat([body, Buffer.from(`\n${n}-${Math.random()}`)]);
        form.append('photos', new Blob([new Uint8Array(unique)], { type: 'image/jpeg' }), `bench-${n}.jpg`);
        const t0 = performance.now();
        const res = await fetch(`${base}/api/workshops/${workshopId}/castings/${castingId}/photos`, {
          method: 'POST',
          headers: { cookie, 'x-csrf-token': session.csrfToken },
          body: form,
        });
        if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${await res.text()}`);
        return performance.now() - t0;
      };
      for (const [label, image] of [
        ['landscape', noise],
        ['portrait (EXIF 6)', portrait],
      ] as const) {
        const alone: number[] = [];
        const viaApi: number[] = [];
        for (let i = 0; i < 8; i++) {
          const t0 = performance.now();
          await processImage(image, { maxPixels: 100_000_000 });
          alone.push(performance.now() - t0);
          viaApi.push(await upload(image, i + (label === 'landscape' ? 0 : 100)));
        }
        alone.sort((a, b) => a - b);
        viaApi.sort((a, b) => a - b);
        rows.push({
          part: `upload 12 MP ${label}`,
          measure: 'median / p95 per photo',
          value: `${ms(percentile(viaApi, 50))} / ${ms(percentile(viaApi, 95))}`,
          floor: `${ms(percentile(alone, 50))} / ${ms(percentile(alone, 95))} (sharp alone)`,
          target: '≤ 1.5 × sharp alone',
          met: percentile(viaApi, 50) <= 1.5 * percentile(alone, 50),
        });
      }
      // A class's burst: 300 photos, four at a time, watching the server's memory from outside.
      const burst = 300;
      const delays = monitorEventLoopDelay({ resolution: 10 });
      delays.enable();
      const rss: number[] = [];
      const sampleRss = () => {
        const out = spawnSync('ps', ['-o', 'rss=', '-p', String(app.pid)]);
        rss.push(Number(out.stdout.toString().trim()) / 1024);
      };
      const t0 = performance.now();
      let next = 0;
      await Promise.all(
        Array.from({ length: 4 }, async () => {
          while (next < burst) {
            const n = next++;
            await upload(n % 2 ? portrait : noise, 1000 + n);
            if (n % 25 === 0) sampleRss();
          }
        }),
      );
      const seconds = (performance.now() - t0) / 1000;
      delays.disable();
      rows.push({
        part: 'upload burst of 300',
        measure: 'photos/s sustained',
        value: (burst / seconds).toFixed(1),
        floor: '—',
        target: '≥ 5 photos/s',
        met: burst / seconds >= 5,
      });
      rows.push({
        part: 'upload burst of 300',
        measure: 'server memory (RSS) first → last sample',
        value: `${rss[0]?.toFixed(0)} → ${rss[rss.length - 1]?.toFixed(0)} MB (max ${Math.max(...rss).toFixed(0)})`,
        floor: '—',
        target: 'flat over the burst',
        met: rss.length > 1 ? rss[rss.length - 1] < rss[0] * 1.5 + 50 : null,
      });
    }

    // ---- the client's bundles ------------------------------------------------
    if (wants('client')) {
      const assets = path.resolve('dist/assets');
      const files = readdirSync(assets).filter((f) => f.endsWith('.js') || f.endsWith('.css'));
      const gz = (f: string) => gzipSync(readFileSync(path.join(assets, f))).length / 1024;
      const html = readFileSync('dist/index.html', 'utf8');
      const entry = [...html.matchAll(/(?:src|href)="\/assets\/([^"]+\.(?:js|css))"/g)].map((m) => m[1]);
      const entryJs = entry.filter((f) => f.endsWith('.js')).reduce((n, f) => n + gz(f), 0);
      const entryCss = entry.filter((f) => f.endsWith('.css')).reduce((n, f) => n + gz(f), 0);
      rows.push({ part: 'client entry', measure: 'JS / CSS after gzip', value: `${entryJs.toFixed(1)} KB / ${entryCss.toFixed(1)} KB`, floor: '—', target: 'JS ≤ 170 KB', met: entryJs <= 170 });
      const chunks = files.filter((f) => f.endsWith('.js') && !entry.includes(f)).map((f) => ({ f, kb: gz(f) }));
      chunks.sort((a, b) => b.kb - a.kb);
      rows.push({
        part: 'client route chunks',
        measure: `${chunks.length} lazy chunks; largest three after gzip`,
        value: chunks.slice(0, 3).map((c) => `${c.f.replace(/-[\w-]{8}\.js$/, '')} ${c.kb.toFixed(1)} KB`).join(', '),
        floor: '—',
        target: 'route-level splitting',
        met: chunks.length > 5,
      });
    }
  }

  // ---- diagnose --------------------------------------------------------------
  if (wants('diagnose')) {
    const domain = await import('../shared/domain/index.ts');
    const r = (await import('../seeders/photo-generator.ts')).rng(7);
    const extra = Array.from({ length: 200 }, (_, i) => ({
      ...domain.DEFAULT_RULES[i % domain.DEFAULT_RULES.length],
      id: `workshop-rule-${i}`,
    }));
    const rules = [...domain.DEFAULT_RULES, ...extra];
    const kinds = domain.DEFECT_KINDS.map((k) => k.id);
    const inputs = Array.from({ length: 1000 }, () => ({
      alloy: domain.findAlloy(r.pick(['A356.0', '413.0', '535.0', 'C90300'])),
      defects: Array.from({ length: r.int(1, 3) }, () => ({ kind: r.pick(kinds), severity: r.int(1, 3) as 1 | 2 | 3 })),
      conditions: {
        pourTempC: r.int(640, 860),
        holdTimeMin: r.int(5, 120),
        chargeKind: r.pick(['ingot', 'clean_scrap', 'dirty_scrap'] as const),
        degassed: r.next() < 0.5,
        relativeHumidityPct: r.int(30, 95),
        ambientTempC: r.int(0, 30),
        moldMaterial: r.pick(domain.MOLD_MATERIALS),
        moldTempC: r.int(20, 400),
      },
    }));
    domain.diagnose(inputs[0], { rules }); // validates the rule set once
    const t0 = performance.now();
    for (const input of inputs) domain.diagnose(input, { rules });
    const per = (performance.now() - t0) / inputs.length;
    rows.push({ part: 'diagnose', measure: `per call, ${rules.length} rules, 1,000 inputs`, value: ms(per), floor: '—', target: '< 1 ms', met: per < 1 });
  }

  // ---- fuzzy search on the client's index -------------------------------------
  if (wants('search')) {
    const Fuse = (await import('fuse.js')).default;
    const items = (
      await db.query(
        `SELECT p.id, p.title, h.alloy, 'Bench Admin' AS "casterName",
                ARRAY(SELECT DISTINCT defect_kind FROM marks m WHERE m.photo_id = p.id) AS kinds
           FROM photos p JOIN castings c ON c.id = p.casting_id JOIN heats h ON h.id = c.heat_id
          ORDER BY p.created_at DESC LIMIT 10000`,
      )
    ).rows;
    const fuse = new Fuse(items, { keys: ['title', 'alloy', 'casterName', 'kinds'], threshold: 0.35, ignoreLocation: true });
    const queries = ['gass porosty', 'A356', 'shrinkage', 'ingot 42', 'cold shut', 'bronze', 'pinhole', 'hot tear'];
    const t0 = performance.now();
    for (let i = 0; i < 40; i++) fuse.search(queries[i % queries.length], { limit: 200 });
    const per = (performance.now() - t0) / 40;
    rows.push({ part: 'fuzzy search (client)', measure: 'fuse.js over 10,000 items, per query', value: ms(per), floor: '—', target: '≤ 100 ms, inside the 200 ms INP budget', met: per <= 100 });
  }
  await db.end();
} catch (error) {
  console.error(error instanceof Error ? error.stack : error);
  process.exitCode = 1;
} finally {
  await stopAll();
}

const widths = [26, 40, 40, 34, 30, 4];
const line = (cells: string[]) => cells.map((c, i) => c.padEnd(widths[i])).join(' │ ');
console.log(`\n${line(['part', 'measure', 'value', 'floor (same run)', 'target', 'met'])}`);
console.log(widths.map((w) => '─'.repeat(w)).join('─┼─'));
for (const r of rows) console.log(line([r.part, r.measure, r.value, r.floor, r.target, r.met === null ? '—' : r.met ? 'yes' : 'no']));
writeFileSync('bench-results.json', JSON.stringify({ measuredAt: new Date().toISOString(), rows }, null, 2));
