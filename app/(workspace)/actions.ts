"use server";
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { switchOrganisation } from "@/lib/server/access";
import { endSession } from "@/lib/server/session";

export async function signOut(): Promise<void> {
  await endSession();
  redirect("/sign-in?signed-out=1");
}

const switchSchema = z.object({ organisationId: z.string().min(1).max(64) });

export async function switchTo(formData: FormData): Promise<void> {
  const parsed = switchSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return;
  // Refused quietly when the person is not a member: the session stays where it was.
  if (await switchOrganisation(parsed.data.organisationId)) revalidatePath("/", "layout");
  redirect("/overview");
}
