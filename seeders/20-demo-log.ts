import { QueryTypes, type Sequelize } from 'sequelize';
import type { Actor, Role } from '../shared/auth/roles.ts';
import { crucibleCreateSchema, crucibleLimitsUpdateSchema, furnaceCreateSchema, mouldCreateSchema } from '../shared/heats/equipment-schemas.ts';
import { heatCreateSchema } from '../shared/heats/heat-schemas.ts';
import * as equipmentService from '../server/modules/equipment/equipment-service.ts';
import * as heatsService from '../server/modules/heats/heats-service.ts';
import * as photosService from '../server/modules/photos/photos-service.ts';
import { DEMO_CRUCIBLES, DEMO_FURNACES, DEMO_LOG_SEED, DEMO_MOULDS, buildDemoLog } from './demo-log.ts';
import { DEMO_WORKSHOP } from './demo-people.ts';
import { drawPiecePhoto, rng } from './photo-generator.ts';

/**
 * The demo class's equipment, four months of heats and the photos of what
 * came out, with the defects marked. Written through the same services the
 * API uses, so every row is one the app itself could have written.
 */
export async function up({ sequelize }: { sequelize: Sequelize }) {
  const [workshop] = await sequelize.query<{ id: string }>('SELECT id FROM workshops WHERE name = :name', {
    replacements: DEMO_WORKSHOP,
    type: QueryTypes.SELECT,
  });
  const members = await sequelize.query<{ id: string; email: string; role: Role }>(
    `SELECT u.id, u.email, m.role FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.workshop_id = :workshopId`,
    { replacements: { workshopId: workshop.id }, type: QueryTypes.SELECT },
  );
  const actor = (email: string): Actor => {
    const m = members.find((x) => x.email === email);
    if (!m) throw new Error(`demo member ${email} is missing`);
    return { id: m.id, role: m.role };
  };
  const admin = actor('morgan@harbourlane.test');
  const w = workshop.id;

  // A run that failed part-way left some of the log behind; start it afresh.
  // (Deleting heats cascades to castings and photos; the photos' objects are
  // queued for deletion by the database.)
  await sequelize.query('DELETE FROM heats WHERE workshop_id = :w', { replacements: { w } });
  for (const table of ['furnaces', 'crucibles', 'moulds', 'crucible_cycle_limits']) {
    await sequelize.query(`DELETE FROM ${table} WHERE workshop_id = :w`, { replacements: { w } });
  }

  const furnaces = new Map<string, string>();
  for (const f of DEMO_FURNACES) {
    furnaces.set(f.key, (await equipmentService.createFurnace(admin, w, furnaceCreateSchema.parse(f))).id);
  }
  const crucibles = new Map<string, string>();
  for (const c of DEMO_CRUCIBLES) {
    const { key: _key, retiredOn: _retiredOn, ...fields } = c;
    crucibles.set(c.key, (await equipmentService.createCrucible(admin, w, crucibleCreateSchema.parse(fields))).id);
  }
  // Silicon carbide outlasts clay-graphite; the class raised its limits.
  await equipmentService.putCrucibleLimits(
    admin,
    w,
    crucibleLimitsUpdateSchema.parse({ limits: [{ material: 'silicon_carbide', warnAt: 60, limitAt: 80 }] }),
  );
  const moulds = new Map<string, string>();
  for (const m of DEMO_MOULDS) {
    const { key: _key, ...fields } = m;
    moulds.set(m.key, (await equipmentService.createMould(admin, w, mouldCreateSchema.parse(fields))).id);
  }

  const r = rng(DEMO_LOG_SEED);
  let photoSeed = 1;
  for (const heat of buildDemoLog(r)) {
    const caster = actor(heat.caster);
    const input = heatCreateSchema.parse({
      casterId: caster.id,
      pouredAt: heat.pouredAt.toISOString(),
      meltStartedAt: new Date(heat.pouredAt.getTime() - heat.meltMinutes * 60_000).toISOString(),
      alloy: heat.alloy,
      furnaceId: furnaces.get(heat.furnace),
      crucibleId: crucibles.get(heat.crucible),
      setpointC: heat.setpointC,
      peakTempC: heat.peakTempC,
      pourTempC: heat.pourTempC,
      chargeLines: heat.chargeLines,
      fluxKind: heat.fluxKind,
      fluxAmountG: heat.fluxAmountG,
      degassing: heat.degassing,
      skimmed: heat.skimmed,
      toolsPreheated: heat.toolsPreheated,
      ambientTempC: heat.ambientTempC,
      relativeHumidityPct: heat.relativeHumidityPct,
      crucibleRemainderG: heat.remainderG,
      notes: heat.notes,
      crucibleShock: heat.crucibleShock,
      safety: { dryTools: heat.toolsPreheated, ppe: true, clearFloor: true },
      castings: heat.castings.map((c) => ({
        mouldId: moulds.get(c.mould),
        mouldPreheatC: c.mouldPreheatC,
        coated: c.coated,
        vented: c.vented,
        pourHeightCm: c.pourHeightCm,
        sectionThicknessMm: c.sectionThicknessMm,
        massG: c.massG,
        quenchMedium: c.quenchMedium,
        airCoolMin: c.airCoolMin,
      })),
    });
    const created = await heatsService.createHeat(caster, w, input);
    for (const [i, casting] of heat.castings.entries()) {
      if (!casting.defects.length && r.next() > 0.25) continue;
      const drawn = await drawPiecePhoto({
        seed: photoSeed++,
        shape: casting.shape,
        defects: casting.defects,
        metal: heat.alloy.startsWith('C') ? 'bronze' : 'aluminium',
      });
      const castingId = created.castings[i].id;
      const [result] = await photosService.uploadPhotos(caster, w, castingId, [
        { originalName: `IMG_${String(4100 + photoSeed).padStart(4, '0')}.jpg`, buffer: drawn.jpeg },
      ]);
      for (const mark of drawn.marks) {
        await photosService.addMark(caster, w, result.photo.id, {
          kind: mark.kind,
          severity: mark.severity,
          shape: mark.shape,
          x: mark.x,
          y: mark.y,
          ...(mark.shape === 'box' ? { width: mark.width, height: mark.height } : {}),
        });
      }
    }
  }

  // The first clay-graphite crucible was retired when the second arrived.
  const retired = DEMO_CRUCIBLES.find((c) => c.retiredOn)!;
  await equipmentService.updateCrucible(admin, w, crucibles.get(retired.key)!, { retired: true, retiredOn: retired.retiredOn });
  await equipmentService.addCrucibleNote(admin, w, crucibles.get('cg1')!, {
    note: 'Vertical crack from the rim after a fast cool on the slab. Retired.',
    notedOn: retired.retiredOn,
  });
  await equipmentService.addCrucibleNote(admin, w, crucibles.get('cg2')!, {
    note: 'Glaze gone at the metal line; walls still sound when tapped.',
    notedOn: '2026-11-19',
  });
}
