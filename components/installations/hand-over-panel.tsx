"use client";
import { Copy, HandHelping } from "lucide-react";
import { useActionState, useEffect, useState } from "react";
import { handOverAction, revokeInstallationLinkAction, type HandOverState } from "@/app/(workspace)/installations/actions";
import { Button, EmptyRow, Field, FormMessage, Select, TBody, TD, TH, THead, TR, Table, TextInput, useToast } from "@/components/ui";
import { initialFormState, type FormState } from "@/lib/validation/form-state";

export interface HandOverLinkRow {
  id: string;
  tokenHint: string;
  createdAt: string;
  expiresAt: string | null;
  revokedAt: string | null;
  lastOpenedAt: string | null;
}

const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

function linkState(link: HandOverLinkRow, now: number) {
  if (link.revokedAt) return "Withdrawn";
  if (link.expiresAt && new Date(link.expiresAt).getTime() <= now) return "Expired";
  return link.expiresAt ? `Open until ${day.format(new Date(link.expiresAt))}` : "Open, no end date";
}

/** Hand the record over: the customer's link (shown once, with its QR code), mailed when an address is given; withdraw any link. */
export function HandOverPanel({ recordId, canEdit, planned, defaultEmail, links }: { recordId: string; canEdit: boolean; planned: boolean; defaultEmail?: string; links: HandOverLinkRow[] }) {
  const [made, makeAction, making] = useActionState<HandOverState, FormData>(handOverAction, initialFormState);
  const [revoked, revokeAction, revoking] = useActionState<FormState, FormData>(revokeInstallationLinkAction, initialFormState);
  const { toast } = useToast();
  const [now] = useState(() => Date.now());
  useEffect(() => {
    if (revoked.message) toast({ title: revoked.message, tone: revoked.ok ? "success" : "error" });
  }, [revoked, toast]);
  return (
    <div className="flex flex-col gap-5">
      {canEdit ? (
        planned ? (
          <p className="text-sm text-ink-soft">Record the fitting first (state: fitted) to hand it over.</p>
        ) : (
          <form action={makeAction} className="grid gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-end" noValidate>
            <input type="hidden" name="recordId" value={recordId} />
            <Field label="Customer's e-mail" help="Leave empty to hand over in person (QR code, print)." error={made.fieldErrors?.email?.[0]}>
              <TextInput type="email" name="email" defaultValue={defaultEmail} autoComplete="off" />
            </Field>
            <Field label="Link works for" error={made.fieldErrors?.expiresInDays?.[0]}>
              <Select name="expiresInDays" defaultValue="">
                <option value="">No end date</option>
                <option value="30">30 days</option>
                <option value="365">A year</option>
              </Select>
            </Field>
            <Button type="submit" loading={making} icon={<HandHelping aria-hidden="true" className="size-4" />}>
              Hand over
            </Button>
          </form>
        )
      ) : (
        <p className="text-sm text-ink-soft">Your role can read this record but not hand it over.</p>
      )}
      {made.message ? <FormMessage tone={made.ok ? "success" : "error"}>{made.message}</FormMessage> : null}
      {made.ok && made.url ? (
        <div className="grid gap-4 rounded-md border border-accent/40 bg-accent-soft/50 p-4 sm:grid-cols-[9rem_1fr]" data-testid="handover-link">
          <div className="size-36 rounded-md bg-white p-2 [&_svg]:h-full [&_svg]:w-full" role="img" aria-label="QR code of the customer's hand-over link" dangerouslySetInnerHTML={{ __html: made.qrSvg ?? "" }} />
          <div className="flex min-w-0 flex-col gap-3">
            <div>
              <p className="text-sm font-medium text-ink">The customer&rsquo;s link</p>
              <p className="text-xs text-ink-soft">Shown once: Towmargin keeps only a fingerprint of it. Let them scan the code, or copy it.</p>
            </div>
            <div className="flex min-w-0 gap-2">
              <TextInput readOnly value={made.url} aria-label="Customer's hand-over link" className="font-mono text-xs" onFocus={(e) => e.currentTarget.select()} />
              <Button
                variant="secondary"
                aria-label="Copy the link"
                onClick={async () => {
                  await navigator.clipboard?.writeText(made.url!).catch(() => undefined);
                  toast({ title: "Link copied.", tone: "success" });
                }}
              >
                <Copy aria-hidden="true" className="size-4" />
              </Button>
            </div>
          </div>
        </div>
      ) : null}
      <Table caption="Hand-over links of this record" hideCaption>
        <THead>
          <TR>
            <TH>Link</TH>
            <TH>Made</TH>
            <TH>State</TH>
            <TH>Last opened</TH>
            <TH>
              <span className="sr-only">Actions</span>
            </TH>
          </TR>
        </THead>
        <TBody>
          {links.length === 0 ? <EmptyRow colSpan={5}>No links yet.</EmptyRow> : null}
          {links.map((link) => {
            const state = linkState(link, now);
            const open = state !== "Withdrawn" && state !== "Expired";
            return (
              <TR key={link.id}>
                <TD className="font-mono text-xs">…{link.tokenHint}</TD>
                <TD>{day.format(new Date(link.createdAt))}</TD>
                <TD>{state}</TD>
                <TD className="text-ink-soft">{link.lastOpenedAt ? day.format(new Date(link.lastOpenedAt)) : "Not yet"}</TD>
                <TD className="text-right">
                  {open && canEdit ? (
                    <form action={revokeAction}>
                      <input type="hidden" name="linkId" value={link.id} />
                      <Button type="submit" size="sm" variant="quiet" loading={revoking} aria-label={`Withdraw the link ending ${link.tokenHint}`}>
                        Withdraw
                      </Button>
                    </form>
                  ) : null}
                </TD>
              </TR>
            );
          })}
        </TBody>
      </Table>
    </div>
  );
}
