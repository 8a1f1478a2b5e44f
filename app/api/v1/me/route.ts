import { getAccess } from "@/lib/server/access";
import { json } from "@/lib/server/http";

export const dynamic = "force-dynamic";

/** Who is signed in, in which organisation and role. */
export async function GET() {
  const access = await getAccess();
  if (!access) return json({ error: "unauthenticated", message: "Sign in first." }, 401);
  return json({
    user: access.user,
    organisation: access.organisation,
    role: access.role,
    memberships: access.memberships,
  });
}
