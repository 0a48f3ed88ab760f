import type { Metadata } from "next";
import { ClassList } from "@/components/home/class-list";
import { listInstructorClasses } from "@/lib/server/homes";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Classes you teach" };

export default async function InstructorHome() {
  const viewer = await requirePageViewer("/teach", "instructor");
  const { classes } = pageData(await listInstructorClasses(viewer));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Classes you teach</h1>
      <ClassList
        classes={classes.map((c) => ({ ...c, href: `/teach/classes/${c.id}` }))}
        empty="No classes yet. A school office adds you to a class."
      />
    </div>
  );
}
