import type { Metadata } from "next";

export const metadata: Metadata = { title: "Colophon", description: "How Axisline is made: typefaces, licences and the sources behind its numbers." };

// A small static page; the lesson benchmark also uses it as its bare baseline (scripts/bench-lesson.ts).
export default function ColophonPage() {
  return (
    <article className="prose prose-axisline max-w-prose">
      <h1>Colophon</h1>
      <p>
        Axisline is set in IBM Plex Sans for reading and JetBrains Mono for figures and readouts. Both are shipped with the app under the SIL Open
        Font License 1.1; nothing is fetched from elsewhere. On a slow connection the first page you open may show your device&apos;s own
        sans-serif, sized to match, rather than wait for the typeface; the pages after it use Plex.
      </p>
      <p>
        Every number a figure shows or a question asks is computed by Axisline&apos;s own tested library, checked against published standards and
        handbooks: IEC 61938 for phantom power, NIOSH 98-126 and 29 CFR 1910.95 for noise exposure, and the classic microphone and sound-system
        engineering texts for pickup patterns and feedback.
      </p>
      <p>The lessons, the demo school, the band and the club are written by the Axisline team and are entirely invented.</p>
    </article>
  );
}
