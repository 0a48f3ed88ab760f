import type { Metadata } from "next";
import { ClassList } from "@/components/home/class-list";
import { ProgressSection } from "@/components/home/progress-section";
import { listApprenticeClasses } from "@/lib/server/homes";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "My classes" };

export default async function ApprenticeHome() {
  const viewer = await requirePageViewer("/learn", "apprentice");
  const { classes } = pageData(await listApprenticeClasses(viewer));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Hello, {viewer.name.split(" ")[0]}</h1>
      <ProgressSection />
      <section aria-labelledby="classes" className="space-y-3">
        <h2 id="classes" className="text-xl font-semibold">Your classes</h2>
        <ClassList classes={classes} showCounts={false} empty="You aren't in a class yet. Your school will send you an invitation." />
      </section>
    </div>
  );
}
