import { requirePageViewer } from "@/lib/server/page-guard";

// The area's guard runs here, before any streaming starts, so the answer is a real 307 or 403.
// Every page and action below checks again in the data-access layer.
export default async function AreaLayout({ children }: { children: React.ReactNode }) {
  await requirePageViewer("/admin", "admin");
  return children;
}
