import { randomUUID } from 'node:crypto';
import { labToLch, labToSrgb, lchToLab, type Lab } from '@mixmark/common';
import type { DataSource } from 'typeorm';
import { Assignment } from '../../assignments/entities/assignment.entity';
import { Attempt } from '../../attempts/entities/attempt.entity';
import { newClassCode } from '../../classes/class-code';
import { ClassMember } from '../../classes/entities/class-member.entity';
import { StudioClass } from '../../classes/entities/studio-class.entity';
import { Drill } from '../../drills/entities/drill.entity';
import { gradeMeasurement } from '../../grading/grade-photo';
import { measurePhoto } from '../../measurement/measure-photo';
import { overlayPlan } from '../../measurement/render-overlay';
import { casts, renderScene } from '../../measurement/testing/photo-scene';
import { seededRandom } from '../../measurement/testing/seeded-random';
import type { PhotoStorage } from '../../storage/photo-storage';
import { storablePhoto } from '../../storage/storable-photo';
import { User } from '../../users/entities/user.entity';
import { demoClasses, demoDrills, studentHabits, type DemoDrill } from './demo-teaching';

const DAY = 86_400_000;

/** A student's mix of a target, `f` of the way from their habitual miss to a perfect match. */
function mixedBy(target: Lab, habit: (typeof studentHabits)[string], f: number, twist = 0): Lab {
  const lch = labToLch(target);
  const neutral = lch.C < 1;
  const C = neutral ? Math.abs(habit.dC) * 0.5 * f : Math.max(0, lch.C + habit.dC * f);
  const h = (neutral ? 65 + habit.dh * 3 : lch.h + habit.dh * f + twist + 360) % 360;
  const L = Math.min(96, Math.max(8, lch.L + habit.dL * f));
  for (let c = C; c >= 0; c -= 0.5) {
    const lab = lchToLab({ L, C: c, h });
    if (labToSrgb(lab).inGamut) return lab;
  }
  return { L, a: 0, b: 0 };
}

/** The swatches under the card's windows for an attempt at a drill. */
function swatchesFor(drill: DemoDrill, habit: (typeof studentHabits)[string], f: number): Lab[] {
  if (drill.kind === 'temperature-pair') {
    // Warmer turns the green's hue towards yellow, cooler towards blue; a weak pair in early weeks.
    const spread = 6 + 10 * (1 - f);
    return [mixedBy(drill.targets[0].lab, habit, f, -spread), mixedBy(drill.targets[0].lab, habit, f, spread)];
  }
  if (drill.kind === 'graded-wash') return [mixedBy(drill.targets[0].lab, habit, f)];
  return drill.targets.map((t, i) => mixedBy(t.lab, habit, f * (1 + 0.15 * (i % 2)), 0));
}

export interface TeachingSeedSummary {
  classes: number;
  drills: number;
  assignments: number;
  attempts: number;
  skipped: boolean;
}

/**
 * Classes, drills, assignments and several weeks of attempts for the demo studio. Each attempt
 * is a synthetic phone photo of the drill's card over the student's mix, measured and graded
 * by the real pipeline (nothing typed in). Runs once: skipped when the teacher has classes.
 */
export async function seedTeaching(dataSource: DataSource, storage: PhotoStorage, now = new Date()): Promise<TeachingSeedSummary> {
  const users = dataSource.getRepository(User);
  const teacher = await users.findOneByOrFail({ email: 'tamsin@saltmarsh-lane.test' });
  if (await dataSource.getRepository(StudioClass).existsBy({ teacherId: teacher.id })) {
    return { classes: 0, drills: 0, assignments: 0, attempts: 0, skipped: true };
  }
  const byKey = new Map<string, User>();
  for (const user of await users.find()) byKey.set(user.email.split('@')[0], user);

  const drills = new Map<string, Drill>();
  for (const demo of demoDrills) {
    drills.set(
      demo.key,
      await dataSource.getRepository(Drill).save({
        ownerId: teacher.id,
        title: demo.title,
        kind: demo.kind,
        instructions: demo.instructions,
        targets: demo.targets.map((t) => ({ ...t, enteredAs: 'lab' as const })),
        tolerance: {},
        palette: demo.palette,
        visibility: demo.visibility,
      }),
    );
  }

  const random = seededRandom(20261201);
  const castNames = Object.keys(casts) as (keyof typeof casts)[];
  let attempts = 0;
  let assignmentCount = 0;
  const photograph = async (demo: DemoDrill, drill: Drill, studentKey: string, when: Date, assignmentId: string | null) => {
    const habit = studentHabits[studentKey];
    const weeksIn = Math.max(0, (35 * DAY - (now.getTime() - when.getTime())) / (7 * DAY));
    const f = habit.keep ** weeksIn;
    const { jpeg } = await renderScene({
      kind: demo.kind,
      steps: demo.kind === 'value-ladder' ? demo.targets.length : undefined,
      swatches: swatchesFor(demo, habit, f),
      // Small photos keep the first start quick (phones take 12 MP; the pipeline is the same).
      width: 1000,
      height: 750,
      cardFraction: 0.45 + random() * 0.2,
      rotation: (random() - 0.5) * 40,
      tiltX: (random() - 0.5) * 16,
      tiltY: (random() - 0.5) * 16,
      ev: -0.6 + random() * 0.9,
      cast: castNames[Math.floor(random() * castNames.length)],
      crossTalk: 0.01,
      flare: 0.01,
      vignetting: 0.12,
      noise: 1.5,
      jpegQuality: 85,
      seed: Math.floor(random() * 1e9),
    });
    const detail = await measurePhoto(jpeg);
    const outcome = gradeMeasurement(drill, detail.result);
    const id = randomUUID();
    // Stored as an upload is: the metadata walked out, the pixels untouched.
    const stored = await storablePhoto(jpeg);
    const photoKey = `attempts/${id}/photo.${stored.extension}`;
    await storage.put(photoKey, stored.bytes);
    // As grading does: the overlay is drawn from this plan when someone first opens it.
    const overlayKey = detail.photo ? `attempts/${id}/overlay.jpg` : null;
    const plan = detail.photo ? overlayPlan(detail) : null;
    const student = byKey.get(studentKey)!;
    await dataSource.getRepository(Attempt).insert({
      id,
      studentId: student.id,
      drillId: drill.id,
      assignmentId,
      photoKey,
      overlayKey,
      overlayPlan: plan,
      photoBytes: stored.bytes.length,
      tries: 1,
      createdAt: when,
      gradedAt: new Date(when.getTime() + 20_000),
      ...(outcome.kind === 'graded'
        ? { state: 'graded' as const, readings: outcome.readings, mark: outcome.mark, score: outcome.mark.score, pass: outcome.mark.pass, quality: { errors: [], warnings: outcome.warnings } }
        : { state: 'needs-retake' as const, quality: { errors: outcome.errors, warnings: outcome.warnings } }),
    });
    attempts += 1;
    return id;
  };

  let classes = 0;
  for (const demoClass of demoClasses) {
    const klass = await dataSource.getRepository(StudioClass).save({ name: demoClass.name, teacherId: teacher.id, studioId: teacher.studioId, code: newClassCode() });
    classes += 1;
    await dataSource.getRepository(ClassMember).insert(
      demoClass.students.map((key, i) => ({ classId: klass.id, studentId: byKey.get(key)!.id, joinedAt: new Date(now.getTime() - (40 - i) * DAY) })),
    );
    for (const [key, dueInDays] of demoClass.assignments) {
      const demo = demoDrills.find((d) => d.key === key)!;
      const drill = drills.get(key)!;
      const dueAt = new Date(now.getTime() + dueInDays * DAY);
      const assignment = await dataSource.getRepository(Assignment).save({ classId: klass.id, drillId: drill.id, dueAt, note: '', createdAt: new Date(dueAt.getTime() - 14 * DAY) });
      assignmentCount += 1;
      for (const [i, studentKey] of demoClass.students.entries()) {
        if (dueInDays > 0 && i % 2 === 1) continue; // some have not started what is still due
        const tries = dueInDays < 0 && i === 0 ? 2 : 1;
        for (let t = 0; t < tries; t += 1) {
          const when = new Date(Math.min(now.getTime() - DAY / 2, dueAt.getTime() - (6 - t * 3 - (i % 3)) * DAY));
          await photograph(demo, drill, studentKey, when, assignment.id);
        }
      }
    }
  }

  // The self-learner practises public drills on her own.
  for (const [key, daysAgo] of [['orange', 20], ['grey', 9], ['orange', 1]] as const) {
    await photograph(demoDrills.find((d) => d.key === key)!, drills.get(key)!, 'noor', new Date(now.getTime() - daysAgo * DAY), null);
  }

  // Two of the teacher's overrides, with comments.
  const [latest] = await dataSource.query<{ id: string }[]>(
    `SELECT a.id FROM attempts a JOIN users u ON u.id = a.student_id WHERE u.email = 'kofi@saltmarsh-lane.test' AND a.state = 'graded' ORDER BY a.created_at DESC LIMIT 1`,
  );
  if (latest) {
    await dataSource.getRepository(Attempt).update(latest.id, {
      overrideScore: 78,
      overridePass: true,
      overrideComment: 'The steps are close in the middle, but the ladder reads evenly from across the room. Accepted; try one more with more water in step 2.',
      overriddenById: teacher.id,
      overriddenAt: now,
    });
  }
  const [streaky] = await dataSource.query<{ id: string }[]>(
    `SELECT a.id FROM attempts a JOIN users u ON u.id = a.student_id WHERE u.email = 'theo@saltmarsh-lane.test' AND a.state = 'graded' ORDER BY a.created_at DESC LIMIT 1`,
  );
  if (streaky) {
    await dataSource.getRepository(Attempt).update(streaky.id, {
      overrideScore: 55,
      overridePass: false,
      overrideComment: 'The colour is near, but the wash dried with a hard edge at the bottom. Keep the bead of paint moving.',
      overriddenById: teacher.id,
      overriddenAt: now,
    });
  }
  return { classes, drills: drills.size, assignments: assignmentCount, attempts, skipped: false };
}
