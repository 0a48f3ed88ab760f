// A school at full scale for `npm run bench:dashboards`, written in a few set-based statements
// (INSERT … SELECT over generate_series), never row by row through the app:
//   1 school, 1 manager, 1 platform admin, 10 instructors (each teaches two classes of one course), 20 classes
//   (four per course), 1,000 apprentices (50 a class) with a seat on every course and a
//   lesson_progress row for every lesson of every course, and 100,000 graded quiz attempts with
//   their saved answers, three sessions per account (two of them ended) and extra time on the final
//   quiz for one apprentice in twenty. Each current apprentice has used every attempt of every bank (61);
//   former apprentices of the school (seated on the courses, in no class any more) hold the rest.
// Graded results come from a pool of templates per bank, graded by the server's own grader
// (gradeSavedAnswers) from answers drawn with a logistic item-response model, so the stored
// results have the shape and size of real ones.
import { createHash } from "node:crypto";
import type { Client } from "pg";
import { demoAnswerFor } from "../../db/seed-quizzes";
import type { Answer } from "../../lib/assessment";
import { fnv1a32, mulberry32 } from "../../lib/assessment/random";
import { listCourses } from "../../lib/content";
import { presenterOf } from "../../lib/server/attempt-presenter";
import { gradeSavedAnswers } from "../../lib/server/attempts";
import { hashPassword } from "../../lib/server/passwords";
import { allBankEntries, questionOrderFor, type BankEntry } from "../../lib/server/quiz-banks";

export type SchoolScale = { apprentices: number; classes: number; instructors: number; attempts: number; templatesPerBank: number };
export const DEFAULT_SCALE: SchoolScale = { apprentices: 1_000, classes: 20, instructors: 10, attempts: 100_000, templatesPerBank: 40 };
export const BENCH_PASSWORD = "bench passphrase behind the mixing desk";
const EMAIL_DOMAIN = "school.bench.example";
export const ADMIN_EMAIL = `admin@${EMAIL_DOMAIN}`;
export const emailOf = (who: "apprentice" | "instructor" | "former", n: number) => `${who}-${n}@${EMAIL_DOMAIN}`;

type Template = { bankId: string; courseSlug: string; t: number; seed: number; questionOrder: string[]; result: unknown; scorePercent: number; passed: boolean; answers: Record<string, Answer> };

/** Graded results of imagined apprentices from weak to strong (ability −1.5 … +1.5 logits). */
function templatesFor(entry: BankEntry, count: number): Template[] {
  const out: Template[] = [];
  const seeds = new Set<number>();
  for (let t = 0; t < count; t++) {
    const random = mulberry32(fnv1a32(`bench:${entry.bank.id}:${t}`));
    let seed = 1 + Math.floor(random() * 2_000_000_000);
    while (seeds.has(seed)) seed++;
    seeds.add(seed);
    const presentationSecret = createHash("sha256").update(`bench template:${entry.bank.id}:${t}`).digest("base64url");
    const questionOrder = questionOrderFor(entry.bank, presenterOf({ presentationSecret, seed }));
    const ability = -1.5 + (3 * t) / Math.max(1, count - 1);
    const answers = new Map<string, Answer>();
    for (const id of questionOrder) {
      if (random() < 0.04) continue; // now and then a question is left unanswered
      const difficulty = (fnv1a32(`difficulty:${id}`) / 0xffffffff) * 2.4 - 1.2;
      answers.set(id, demoAnswerFor(entry.questionsById.get(id)!, random() < 1 / (1 + Math.exp(-1.7 * (ability - difficulty))), seed));
    }
    const { stored, passed } = gradeSavedAnswers(entry, { seed, questionOrder }, answers, false);
    out.push({ bankId: entry.bank.id, courseSlug: entry.courseSlug, t, seed, questionOrder, result: stored, scorePercent: stored.percent, passed, answers: Object.fromEntries(answers) });
  }
  return out;
}

export type SeededSchool = { classIds: string[]; courseSlugs: string[]; instructorClassIds: string[]; formerApprentices: number };

/** Seeds the school into an empty, migrated database through `client`. */
export async function seedSchool(client: Client, scale: SchoolScale, log: (line: string) => void): Promise<SeededSchool> {
  const courses = await listCourses();
  const courseSlugs = courses.map((c) => c.slug);
  const entries = (await allBankEntries()).sort((a, b) => a.bank.id.localeCompare(b.bank.id));
  const perApprentice = entries.reduce((n, e) => n + e.bank.settings.attemptsAllowed, 0);
  const formerApprentices = Math.max(0, Math.ceil((scale.attempts - scale.apprentices * perApprentice) / perApprentice));
  const passwordHash = await hashPassword(BENCH_PASSWORD); // one hash: every bench account shares the password
  await client.query("set synchronous_commit = off");

  const [school] = (await client.query<{ id: string }>(`insert into schools (slug, name) values ('bench-school', 'Bench School of Live Sound') returning id`)).rows;
  const people = `insert into users (email, name, password_hash, role, email_verified_at)
    select format('%s-%s@${EMAIL_DOMAIN}', $1::text, g), format('%s %s', $2::text, lpad(g::text, 4, '0')), $3, $4::role, now() from generate_series(1, $5::int) g`;
  await client.query(people, ["instructor", "Instructor", passwordHash, "instructor", scale.instructors]);
  await client.query(people, ["apprentice", "Apprentice", passwordHash, "apprentice", scale.apprentices]);
  await client.query(people, ["former", "Former apprentice", passwordHash, "apprentice", formerApprentices]);
  await client.query(`insert into users (email, name, password_hash, role, email_verified_at) values ('manager@${EMAIL_DOMAIN}', 'School Manager', $1, 'school_manager', now())`, [passwordHash]);
  await client.query(
    `insert into school_members (school_id, user_id, role) select $1, id, (case role when 'school_manager' then 'manager' else role::text end)::school_member_role from users where email like '%@${EMAIL_DOMAIN}'`,
    [school.id],
  );
  await client.query(`insert into users (email, name, password_hash, role, email_verified_at) values ('${ADMIN_EMAIL}', 'Platform Admin', $1, 'admin', now())`, [passwordHash]);
  // Sessions grow with the school too: each account has signed in three times, two of them over.
  await client.query(
    `insert into sessions (user_id, session_version, created_at, expires_at, last_seen_at, revoked_at)
     select u.id, 1, now() - k * interval '10 days', now() - k * interval '10 days' + interval '14 days', now() - k * interval '10 days' + interval '2 hours', case when k = 1 then now() - interval '9 days' end
     from users u, generate_series(1, 3) k where u.email like '%@${EMAIL_DOMAIN}'`,
  );

  // Class c (0-based) is on course c mod 5; instructor i teaches classes i-1 and i-1+10 (same course).
  const perClass = Math.ceil(scale.apprentices / scale.classes);
  const classIds = (
    await client.query<{ id: string }>(
      `insert into classes (school_id, name, course_slug, term, seats_purchased, seats_claimed)
       select $1, format('Group %s', lpad((c + 1)::text, 2, '0')), ($2::text[])[c % array_length($2::text[], 1) + 1], 'Spring term', $3, $3
       from generate_series(0, $4::int - 1) c order by c returning id`,
      [school.id, courseSlugs, perClass, scale.classes],
    )
  ).rows.map((r) => r.id);
  const numbered = (who: string) => `(select id, split_part(split_part(email, '@', 1), '-', 2)::int as n from users where email like '${who}-%@${EMAIL_DOMAIN}')`;
  await client.query(
    `insert into class_members (class_id, user_id, role) select ($1::uuid[])[c + 1], u.id, 'instructor' from ${numbered("instructor")} u, generate_series(0, $2::int - 1) c where c % $3::int = u.n - 1`,
    [classIds, scale.classes, scale.instructors],
  );
  await client.query(`insert into class_members (class_id, user_id, role) select ($1::uuid[])[(u.n - 1) % $2::int + 1], u.id, 'apprentice' from ${numbered("apprentice")} u`, [classIds, scale.classes]);
  await client.query(
    `insert into enrollments (user_id, course_slug, source, class_id)
     select cm.user_id, s.slug, (case when s.slug = k.course_slug then 'class' else 'purchase' end)::enrollment_source, case when s.slug = k.course_slug then k.id end
     from class_members cm join classes k on k.id = cm.class_id, unnest($1::text[]) s(slug) where cm.role = 'apprentice'`,
    [courseSlugs],
  );
  await client.query(`insert into enrollments (user_id, course_slug, source) select u.id, s.slug, 'purchase' from ${numbered("former")} u, unnest($1::text[]) s(slug)`, [courseSlugs]);
  log(`school: ${scale.instructors} instructors, ${scale.classes} classes, ${scale.apprentices} apprentices, ${formerApprentices} former apprentices`);

  // Every lesson of every course: the first `frontier` share of each course done, the rest viewed.
  const lessons = courses.flatMap((c) => c.modules.flatMap((m) => m.lessons).map((l, i, all) => ({ course: c.slug, id: l.id, at: i / all.length })));
  await client.query(
    `insert into lesson_progress (user_id, course_slug, lesson_id, completed_at, last_viewed_at)
     select u.id, l.course, l.id,
       case when l.at < (abs(hashtext(u.id::text || l.course)) % 101) / 100.0 then now() - (l.at * 60 + 1) * interval '1 day' end,
       now() - (l.at * 60) * interval '1 day' - (abs(hashtext(u.id::text || l.id)) % 1440) * interval '1 minute'
     from ${numbered("apprentice")} u, unnest($1::text[], $2::text[], $3::float8[]) l(course, id, at)`,
    [lessons.map((l) => l.course), lessons.map((l) => l.id), lessons.map((l) => l.at)],
  );
  log(`lesson_progress: ${scale.apprentices} × ${lessons.length} lessons`);

  await seedAttempts(client, entries, scale, log);
  // One apprentice in twenty has extra time on their class's final quiz, granted by its instructor.
  await client.query(
    `insert into quiz_time_extensions (user_id, bank_id, extra_minutes, granted_by)
     select cm.user_id, 'bank-' || k.course_slug || '-final', 20, (select t.user_id from class_members t where t.class_id = k.id and t.role = 'instructor' limit 1)
     from class_members cm join classes k on k.id = cm.class_id where cm.role = 'apprentice' and abs(hashtext(cm.user_id::text)) % 20 = 0`,
  );
  await client.query("vacuum analyze");
  return { classIds, courseSlugs, instructorClassIds: [classIds[0], classIds[scale.instructors] ?? classIds[0]], formerApprentices };
}

async function seedAttempts(client: Client, entries: BankEntry[], scale: SchoolScale, log: (line: string) => void): Promise<void> {
  await client.query(`create temporary table bench_templates (bank_id text, course_slug text, t int, seed int, question_order jsonb, result jsonb, score_percent float8, passed boolean, answers jsonb, allowed int, timed boolean)`);
  for (const entry of entries) {
    const rows = templatesFor(entry, scale.templatesPerBank);
    await client.query(
      `insert into bench_templates select x.bank_id, x.course_slug, x.t, x.seed, x.question_order, x.result, x.score_percent, x.passed, x.answers, $2, $3 from jsonb_to_recordset($1::jsonb) as x(bank_id text, course_slug text, t int, seed int, question_order jsonb, result jsonb, score_percent float8, passed boolean, answers jsonb)`,
      [JSON.stringify(rows.map((r) => ({ bank_id: r.bankId, course_slug: r.courseSlug, t: r.t, seed: r.seed, question_order: r.questionOrder, result: r.result, score_percent: r.scorePercent, passed: r.passed, answers: r.answers }))), entry.bank.settings.attemptsAllowed, entry.bank.settings.timeLimitMinutes !== null],
    );
  }
  // Current apprentices first (rank 0), then former ones, each attempt n of every bank, cut at the total.
  const started = Date.now();
  await client.query(
    `insert into quiz_attempts (user_id, bank_id, course_slug, seed, presentation_secret, question_order, started_at, deadline_at, submitted_at, score_percent, passed, result)
     select p.user_id, t.bank_id, t.course_slug, t.seed, md5(p.user_id::text || t.bank_id || p.n) || md5(t.bank_id || p.n || p.user_id::text), t.question_order,
       p.started, case when t.timed then p.started + interval '40 minutes' end, p.started + interval '22 minutes', t.score_percent, t.passed, t.result
     from (
       select u.id as user_id, b.bank_id, n, now() - ((abs(hashtext(u.id::text || b.bank_id)) % 300) + (4 - n) * 7) * interval '1 hour' as started,
         abs(hashtext(u.id::text || b.bank_id || n)) % $2::int as template
       from users u
       cross join (select distinct bank_id, allowed from bench_templates) b
       cross join lateral generate_series(1, b.allowed) n
       where u.email like '%@${EMAIL_DOMAIN}' and u.role = 'apprentice'
       order by (u.email like 'former-%'), u.email, b.bank_id, n
       limit $1::int
     ) p join bench_templates t on t.bank_id = p.bank_id and t.t = p.template`,
    [scale.attempts, scale.templatesPerBank],
  );
  log(`quiz_attempts: ${scale.attempts} graded (${scale.templatesPerBank} result templates per bank) in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  const answersStarted = Date.now();
  const { rowCount } = await client.query(
    `insert into quiz_answers (attempt_id, question_id, answer, seq, saved_at)
     select a.id, kv.key, kv.value, kv.ord, a.started_at + kv.ord * interval '40 seconds'
     from quiz_attempts a join bench_templates t on t.bank_id = a.bank_id and t.seed = a.seed
     cross join lateral jsonb_each(t.answers) with ordinality kv(key, value, ord)`,
  );
  log(`quiz_answers: ${rowCount} saved answers in ${((Date.now() - answersStarted) / 1000).toFixed(1)} s`);
}
