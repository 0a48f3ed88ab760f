import { redirect } from "next/navigation";
import { HOME_BY_ROLE, requirePageViewer } from "@/lib/server/page-guard";

// One address for "my home": each role has its own.
export default async function HomeRedirect() {
  const viewer = await requirePageViewer("/home");
  redirect(HOME_BY_ROLE[viewer.role]);
}
