// next-auth's own endpoints (session, csrf). Sign-in happens in /api/account/*.
import NextAuth from "next-auth";
import { authOptions } from "@/lib/server/auth-options";

const handler = (req: Request, ctx: { params: Promise<{ nextauth: string[] }> }) => NextAuth(req as never, ctx as never, authOptions());
export { handler as GET, handler as POST };
