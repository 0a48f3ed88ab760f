import type { Metadata } from "next";
import { ClassList } from "@/components/home/class-list";
import { listManagedSchools } from "@/lib/server/homes";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "School office" };

export default async function SchoolOfficeHome() {
  const viewer = await requirePageViewer("/school", "school_manager");
  const { schools } = pageData(await listManagedSchools(viewer));
  return (
    <div className="space-y-8">
      <h1 className="text-3xl font-bold">School office</h1>
      {schools.length === 0 && <p className="text-ink-muted">You don&apos;t manage a school yet.</p>}
      {schools.map((s) => (
        <section key={s.schoolId} aria-labelledby={`school-${s.schoolId}`} className="space-y-3">
          <h2 id={`school-${s.schoolId}`} className="text-xl font-semibold">{s.schoolName}</h2>
          <ClassList classes={s.classes} empty="This school has no classes yet." />
        </section>
      ))}
    </div>
  );
}
