import type { Metadata } from "next";
import Link from "next/link";
import { OfficeClassList } from "@/components/school-office/office-class-list";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { listOfficeSchools } from "@/lib/server/school-office";

export const metadata: Metadata = { title: "School office" };

export default async function SchoolOfficeHome() {
  const viewer = await requirePageViewer("/school", "school_manager");
  const { schools } = pageData(await listOfficeSchools(viewer));
  return (
    <div className="space-y-8">
      <header className="space-y-2">
        <h1 className="text-3xl font-bold">School office</h1>
        <p className="text-ink-muted">
          Open a class to invite apprentices, follow their progress and manage its seats. <Link href="/school/buy">Buy seats</Link> ·{" "}
          <Link href="/school/orders">Orders and refunds</Link>
        </p>
      </header>
      {schools.length === 0 && <p className="text-ink-muted">You don&apos;t manage a school yet.</p>}
      {schools.map((s) => (
        <section key={s.schoolId} aria-labelledby={`school-${s.schoolId}`} className="space-y-3">
          <h2 id={`school-${s.schoolId}`} className="text-xl font-semibold">
            {s.schoolName}
          </h2>
          <OfficeClassList classes={s.classes} />
        </section>
      ))}
    </div>
  );
}
