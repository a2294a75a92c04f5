import { QueryTypes, type Sequelize } from 'sequelize';
import type { Actor, Role } from '../shared/auth/roles.ts';
import { hardnessCreateSchema, heatTreatmentCreateSchema, stepsActualUpdateSchema } from '../shared/heat-treatment/heat-treatment-schemas.ts';
import { commentCreateSchema } from '../shared/reports/comment-schemas.ts';
import { reportCreateSchema, reportTransitionSchema } from '../shared/reports/report-schemas.ts';
import * as commentsService from '../server/modules/comments/comments-service.ts';
import * as heatTreatmentService from '../server/modules/heat-treatment/heat-treatment-service.ts';
import * as reportsService from '../server/modules/reports/reports-service.ts';
import { DEMO_WORKSHOP } from './demo-people.ts';

/**
 * The class's defect reports in every state, with mentors' comments on the
 * marks and confirmed causes, a follow-up heat, and two heat-treatment
 * records. Written through the services, then dated back to when they would
 * have happened in the invented term.
 */

type MarkedCasting = { castingId: string; heatId: string; pouredAt: Date; kinds: string[]; markId: string };

type Plan = {
  student: string;
  mentor: string;
  kind: string;
  end: 'draft' | 'submitted' | 'in_review' | 'resolved';
  title: string;
  question: string;
  comments?: { by: 'mentor' | 'student'; body: string; onMark?: boolean }[];
  causes?: { variable: string; note: string; fixesToTry: string[] }[];
  resolution?: string;
  followUp?: boolean;
};

const PLANS: Plan[] = [
  {
    student: 'jonah@harbourlane.test',
    mentor: 'priya@harbourlane.test',
    kind: 'gas_porosity',
    end: 'resolved',
    title: 'Bubbles all through my wheel-scrap ingot',
    question: 'I cut the ingot and it is full of round holes near the top. The melt looked clean. What happened?',
    comments: [
      { by: 'mentor', body: 'These are **round and smooth-walled**: gas, not shrinkage. Look at your pour temperature in the heat log.', onMark: true },
      { by: 'student', body: 'It sat in the furnace while I set up the mould, so it got hot.' },
    ],
    causes: [
      { variable: 'pour_temperature', note: 'Poured far above the alloy’s range; hydrogen solubility climbs steeply with temperature.', fixesToTry: ['Pour within the alloy’s range', 'Set up the mould before the metal is ready'] },
      { variable: 'degassing', note: 'No degassing on a scrap charge.', fixesToTry: ['Degas with a tablet and a preheated plunger'] },
    ],
    resolution: 'Too hot and not degassed. Try the next heat at 720 °C with a tablet.',
    followUp: true,
  },
  {
    student: 'jonah@harbourlane.test',
    mentor: 'priya@harbourlane.test',
    kind: 'dross_inclusions',
    end: 'in_review',
    title: 'Dark lumps near the top face',
    question: 'There are black bits stuck in the top of the ingot. Is that the paint on the scrap?',
    comments: [{ by: 'mentor', body: 'Probably dross from the painted pieces. Did you skim just before pouring?', onMark: true }],
  },
  {
    student: 'lena@harbourlane.test',
    mentor: 'priya@harbourlane.test',
    kind: 'pinholes',
    end: 'resolved',
    title: 'Pinholes under the skin of the sand plate',
    question: 'Fine holes just under the top surface. My temperatures were in range this time.',
    comments: [{ by: 'mentor', body: 'Your temperature was fine. It was a muggy evening and the melt was not degassed: moisture brings hydrogen.', onMark: true }],
    causes: [
      { variable: 'humidity', note: 'A high dew point on the night.', fixesToTry: ['Keep the shed door open, keep flux and tools dry'] },
      { variable: 'degassing', note: 'Not degassed.', fixesToTry: ['Degas every aluminium melt, especially on humid nights'] },
    ],
    resolution: 'Moisture plus no degassing. Degas on humid evenings.',
  },
  {
    student: 'lena@harbourlane.test',
    mentor: 'priya@harbourlane.test',
    kind: 'oxide_inclusions',
    end: 'draft',
    title: 'Grey wrinkles on a machined face',
    question: 'Still writing this one up.',
  },
  {
    student: 'sam@harbourlane.test',
    mentor: 'tomasz@harbourlane.test',
    kind: 'rounded_edges',
    end: 'resolved',
    title: 'Muffin ingots come out with round corners',
    question: 'Since October my muffin-tin ingots have soft, rounded edges and one had a corner missing.',
    comments: [{ by: 'mentor', body: 'The tin went in barely warm. A cold steel mould freezes the metal before it fills the corners.', onMark: true }],
    causes: [{ variable: 'mold_temperature', note: 'Mould well below the 150–250 °C that keeps the metal running.', fixesToTry: ['Preheat the tin on the furnace lid for 15 minutes', 'Check it with the surface thermometer'] }],
    resolution: 'Cold mould. Preheat it properly.',
  },
  {
    student: 'sam@harbourlane.test',
    mentor: 'tomasz@harbourlane.test',
    kind: 'misrun',
    end: 'submitted',
    title: 'Short corner again',
    question: 'Preheated this time but still a missing corner. Maybe I poured too slowly?',
  },
  {
    student: 'aiko@harbourlane.test',
    mentor: 'tomasz@harbourlane.test',
    kind: 'shrinkage_sink',
    end: 'resolved',
    title: 'Dish in the middle of the thick bar',
    question: 'The top of my thick graphite-mould bar sinks in the middle. The walls of the dip are rough.',
    comments: [{ by: 'mentor', body: 'Rough, jagged walls say shrinkage. The section is thick and nothing feeds it.', onMark: true }],
    causes: [{ variable: 'feeding', note: 'A heavy section with no riser or hot top.', fixesToTry: ['Top up the mould with hot metal as it freezes', 'Add a riser or pour thinner bars'] }],
    resolution: 'Feeding: top it up or pour thinner.',
  },
  {
    student: 'aiko@harbourlane.test',
    mentor: 'tomasz@harbourlane.test',
    kind: 'ingot_pipe',
    end: 'in_review',
    title: 'Crack-like hole down the centre',
    question: 'Is this the same problem as my sink, or something else?',
  },
];

export async function up({ sequelize }: { sequelize: Sequelize }) {
  const [workshop] = await sequelize.query<{ id: string }>('SELECT id FROM workshops WHERE name = :name', {
    replacements: DEMO_WORKSHOP,
    type: QueryTypes.SELECT,
  });
  const w = workshop.id;
  const members = await sequelize.query<{ id: string; email: string; role: Role }>(
    'SELECT u.id, u.email, m.role FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.workshop_id = :w',
    { replacements: { w }, type: QueryTypes.SELECT },
  );
  const actor = (email: string): Actor => {
    const m = members.find((x) => x.email === email)!;
    return { id: m.id, role: m.role };
  };
  // A run that failed part-way may have left reports or plans; start afresh.
  await sequelize.query('DELETE FROM reports WHERE workshop_id = :w', { replacements: { w } });
  await sequelize.query('DELETE FROM heat_treatments WHERE workshop_id = :w', { replacements: { w } });

  const castingsOf = async (casterId: string) =>
    sequelize.query<MarkedCasting>(
      `SELECT c.id AS "castingId", h.id AS "heatId", h.poured_at AS "pouredAt",
              array_agg(DISTINCT m.defect_kind) AS kinds, min(m.id::text) AS "markId"
         FROM castings c JOIN heats h ON h.id = c.heat_id
         JOIN photos p ON p.casting_id = c.id JOIN marks m ON m.photo_id = p.id
        WHERE c.workshop_id = :w AND h.caster_id = :casterId
        GROUP BY c.id, h.id ORDER BY h.poured_at`,
      { replacements: { w, casterId }, type: QueryTypes.SELECT },
    );

  const used = new Set<string>();
  for (const plan of PLANS) {
    const student = actor(plan.student);
    const mentor = actor(plan.mentor);
    const casting = (await castingsOf(student.id)).find((c) => c.kinds.includes(plan.kind) && !used.has(c.castingId));
    if (!casting) continue;
    used.add(casting.castingId);
    const [{ markId }] = await sequelize.query<{ markId: string }>(
      `SELECT m.id AS "markId" FROM marks m JOIN photos p ON p.id = m.photo_id WHERE p.casting_id = :castingId AND m.defect_kind = :kind LIMIT 1`,
      { replacements: { castingId: casting.castingId, kind: plan.kind }, type: QueryTypes.SELECT },
    );
    const report = await reportsService.createReport(
      student,
      w,
      reportCreateSchema.parse({ castingId: casting.castingId, title: plan.title, question: plan.question }),
    );
    const move = (who: Actor, body: unknown) => reportsService.transition(who, w, report.id, reportTransitionSchema.parse(body));
    if (plan.end !== 'draft') await move(student, { action: 'submit' });
    if (plan.end === 'in_review' || plan.end === 'resolved') await move(mentor, { action: 'start_review' });
    for (const c of plan.comments ?? []) {
      if (plan.end === 'draft' || plan.end === 'submitted') break;
      await commentsService.createComment(c.by === 'mentor' ? mentor : student, w, report.id, commentCreateSchema.parse({ body: c.body, ...(c.onMark ? { markId } : {}) }));
    }
    if (plan.end === 'resolved') await move(mentor, { action: 'resolve', note: plan.resolution, causes: plan.causes });
    if (plan.followUp) {
      const [next] = await sequelize.query<{ id: string }>(
        'SELECT id FROM heats WHERE workshop_id = :w AND caster_id = :caster AND poured_at > :after ORDER BY poured_at LIMIT 1',
        { replacements: { w, caster: student.id, after: casting.pouredAt }, type: QueryTypes.SELECT },
      );
      if (next) await reportsService.linkFollowUp(student, w, report.id, { heatId: next.id });
    }
    // Date it all back to the days after the pour, as it would have happened.
    const day = (n: number) => new Date(new Date(casting.pouredAt).getTime() + n * 86_400_000);
    await sequelize.query(
      `UPDATE reports SET created_at = :d1, updated_at = :d3,
              submitted_at = CASE WHEN submitted_at IS NULL THEN NULL ELSE CAST(:d1 AS timestamptz) END,
              resolved_at = CASE WHEN resolved_at IS NULL THEN NULL ELSE CAST(:d3 AS timestamptz) END
        WHERE id = :id`,
      { replacements: { id: report.id, d1: day(1), d3: day(3) } },
    );
    await sequelize.query('UPDATE report_events SET created_at = :d2 WHERE report_id = :id', { replacements: { id: report.id, d2: day(2) } });
    await sequelize.query('UPDATE comments SET created_at = :d2, updated_at = :d2 WHERE report_id = :id', { replacements: { id: report.id, d2: day(2) } });
  }

  // Heat treatment: Aiko takes two A356 bars through T6; Lena plans a T5.
  const aiko = actor('aiko@harbourlane.test');
  const [a1, a2] = await sequelize.query<{ id: string; pouredAt: Date }>(
    `SELECT c.id, h.poured_at AS "pouredAt" FROM castings c JOIN heats h ON h.id = c.heat_id
      WHERE c.workshop_id = :w AND h.caster_id = :id ORDER BY h.poured_at DESC LIMIT 2`,
    { replacements: { w, id: aiko.id }, type: QueryTypes.SELECT },
  );
  if (a1 && a2) {
    const plan = await heatTreatmentService.createPlan(
      aiko,
      w,
      heatTreatmentCreateSchema.parse({ alloy: 'A356.0', temper: 'T6', castingIds: [a1.id, a2.id], oven: 'Pottery kiln (shared)', notes: 'First T6 attempt for the class.' }),
    );
    const start = new Date(new Date(a1.pouredAt).getTime() + 2 * 86_400_000);
    const at = (h: number) => new Date(start.getTime() + h * 3_600_000).toISOString();
    await heatTreatmentService.recordSteps(aiko, w, plan.id, stepsActualUpdateSchema.parse({
      steps: [
        { stepIndex: 0, startedAt: at(0), endedAt: at(8), temperatureC: 538, notes: 'Kiln held within a few degrees after the first hour.' },
        { stepIndex: 1, startedAt: at(8), endedAt: at(8.01), temperatureC: 80, quenchMedium: 'water', quenchDelayS: 12 },
        { stepIndex: 2, startedAt: at(9), endedAt: at(13), temperatureC: 157 },
      ],
    }));
    for (const [castingId, value] of [[a1.id, 82], [a2.id, 79]] as const) {
      await heatTreatmentService.addHardness(aiko, w, plan.id, hardnessCreateSchema.parse({ scale: 'HB', value, castingId, locationNote: 'top face, ground flat' }));
    }
  }
  const lena = actor('lena@harbourlane.test');
  const [l1] = await sequelize.query<{ id: string }>(
    `SELECT c.id FROM castings c JOIN heats h ON h.id = c.heat_id WHERE c.workshop_id = :w AND h.caster_id = :id ORDER BY h.poured_at DESC LIMIT 1`,
    { replacements: { w, id: lena.id }, type: QueryTypes.SELECT },
  );
  if (l1) {
    await heatTreatmentService.createPlan(
      lena,
      w,
      heatTreatmentCreateSchema.parse({ alloy: 'A356.0', temper: 'T5', castingIds: [l1.id], oven: 'Kitchen oven at home', notes: 'Ageing only; no solution step at home.' }),
    );
  }
}
