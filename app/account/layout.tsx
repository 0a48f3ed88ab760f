import { requirePageViewer } from "@/lib/server/page-guard";

// Guard before streaming starts (the page has a loading state), so signed-out visitors get a real 307.
export default async function AccountLayout({ children }: { children: React.ReactNode }) {
  await requirePageViewer("/account");
  return children;
}
