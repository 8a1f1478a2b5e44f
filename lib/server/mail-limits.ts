import "server-only";
import { env } from "@/lib/env";
import type { AccessContext } from "./access";
import { consume } from "./rate-limit";

const HOUR_MS = 60 * 60 * 1000;

export const MAIL_LIMIT_MESSAGE = "You have sent a lot of mail in the last hour. Try again later.";

/**
 * Counts one message sent on a member's behalf (an invitation, a customer link) against the member and
 * against the organisation, so a signed-up stranger cannot use the app to mail the world. Once the member is
 * refused, the organisation's counter is left alone. Returns the refusal message, or null.
 */
export async function limitMemberMail(access: AccessContext): Promise<string | null> {
  const byMember = await consume(`mail:member:${access.organisation.id}:${access.user.id}`, env.MAIL_LIMIT_PER_MEMBER_PER_HOUR, HOUR_MS);
  if (!byMember.allowed) return MAIL_LIMIT_MESSAGE;
  const byOrganisation = await consume(`mail:organisation:${access.organisation.id}`, env.MAIL_LIMIT_PER_ORGANISATION_PER_HOUR, HOUR_MS);
  return byOrganisation.allowed ? null : MAIL_LIMIT_MESSAGE;
}
