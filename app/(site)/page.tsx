import Link from "next/link";

const AUDIENCES = [
  {
    id: "for-apprentices",
    title: "For apprentices",
    body: "Work through lessons on transducers, pickup patterns, direct boxes and miking a whole band. Turn a pattern and watch the monitor wedge drop away; slide a mic closer and see the bass rise. Upload photos of your own placements and get them reviewed.",
  },
  {
    id: "for-instructors",
    title: "For instructors",
    body: "See where each apprentice in your class stands, review placement photos against a rubric, and read how every quiz question performs so you can fix the weak ones.",
  },
  {
    id: "for-schools",
    title: "For schools",
    body: "Buy seats for a class, invite the roster, move unused seats, and follow progress. Graduates leave with a certificate an employer can check by its code.",
  },
];

export default function LandingPage() {
  return (
    <div className="space-y-16">
      <section className="grid items-center gap-10 md:grid-cols-[1.2fr_1fr]">
        <div>
          <p className="font-mono text-sm uppercase tracking-widest text-accent-text">Live-sound training</p>
          <h1 className="mt-3 text-4xl font-bold leading-tight md:text-5xl">Mic the band right, every night, in every room.</h1>
          <p className="mt-5 max-w-prose text-lg text-ink-muted">
            Axisline teaches the stage side of live sound: choosing, placing and cabling microphones and direct boxes, setting gain, keeping feedback
            and phase problems away, and working safely around power, loud sound and overhead loads.
          </p>
          <div className="mt-8 flex flex-wrap gap-3">
            <Link href="/sign-up" className="inline-flex min-h-11 items-center rounded-md bg-accent px-5 font-semibold text-accent-ink hover:bg-accent-hover">
              Start as an apprentice
            </Link>
            <Link href="/sign-in" className="inline-flex min-h-11 items-center rounded-md border border-border px-5 font-semibold text-ink hover:bg-surface-sunken">
              Sign in
            </Link>
          </div>
        </div>
        <PolarHero />
      </section>
      <section aria-labelledby="who" className="space-y-6">
        <h2 id="who" className="text-2xl font-bold">Who Axisline is for</h2>
        <div className="grid gap-6 md:grid-cols-3">
          {AUDIENCES.map((a) => (
            <article key={a.id} id={a.id} className="scroll-mt-24 rounded-xl border border-rule bg-surface-raised p-6">
              <h3 className="text-xl font-semibold">{a.title}</h3>
              <p className="mt-3 text-ink-muted">{a.body}</p>
            </article>
          ))}
        </div>
      </section>
      <section className="rounded-xl border border-caution bg-caution-soft p-6">
        <h2 className="text-xl font-semibold">Safety first, always</h2>
        <p className="mt-2 max-w-prose text-ink">
          Lessons on hearing, mains power, phantom power, stands and cable runs show the usual cautions. They never replace local codes, venue rules or
          the work of licensed electricians and riggers.
        </p>
      </section>
    </div>
  );
}

/** A supercardioid trace on a polar grid: decoration, so hidden from assistive technology. */
function PolarHero() {
  const a = (Math.sqrt(3) - 1) / 2;
  const points = Array.from({ length: 181 }, (_, i) => {
    const t = (i * 2 * Math.PI) / 180;
    const r = Math.abs(a + (1 - a) * Math.cos(t)) * 120;
    return `${(150 + r * Math.sin(t)).toFixed(1)},${(150 - r * Math.cos(t)).toFixed(1)}`;
  });
  return (
    <svg viewBox="0 0 300 300" className="mx-auto w-full max-w-sm text-ink" aria-hidden="true">
      {[40, 80, 120].map((r) => (
        <circle key={r} cx="150" cy="150" r={r} fill="none" stroke="currentColor" strokeOpacity="0.2" />
      ))}
      <line x1="150" y1="20" x2="150" y2="280" stroke="currentColor" strokeOpacity="0.2" />
      <line x1="20" y1="150" x2="280" y2="150" stroke="currentColor" strokeOpacity="0.2" />
      <polygon points={points.join(" ")} fill="var(--color-accent-soft)" stroke="var(--color-accent-line)" strokeWidth="2.5" />
    </svg>
  );
}
