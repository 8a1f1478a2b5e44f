"use client";
import { Copy, Link2, Mail } from "lucide-react";
import { useActionState, useEffect, useState } from "react";
import { Button, Field, FormMessage, Select, TBody, TD, TH, THead, TR, Table, TextInput, useToast, EmptyRow } from "@/components/ui";
import { initialFormState, type FormState } from "@/lib/validation/form-state";
import { createLinkAction, emailLinkAction, revokeLinkAction, type CreateLinkState } from "./actions";

export interface ShareLinkRow {
  id: string;
  tokenHint: string;
  createdAt: string;
  expiresAt: string | null;
  revokedAt: string | null;
  lastOpenedAt: string | null;
}

const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

function linkState(link: ShareLinkRow, now: number) {
  if (link.revokedAt) return "Withdrawn";
  if (link.expiresAt && new Date(link.expiresAt).getTime() <= now) return "Expired";
  return link.expiresAt ? `Open until ${day.format(new Date(link.expiresAt))}` : "Open, no end date";
}

export function SharePanel({ checkId, links, canShare, defaultEmail, usualDays }: { checkId: string; links: ShareLinkRow[]; canShare: boolean; defaultEmail?: string; usualDays: number }) {
  const [created, createAction, creating] = useActionState<CreateLinkState, FormData>(createLinkAction, initialFormState);
  const [mailed, mailAction, mailing] = useActionState<FormState, FormData>(emailLinkAction, initialFormState);
  const [revoked, revokeAction, revoking] = useActionState<FormState, FormData>(revokeLinkAction, initialFormState);
  const { toast } = useToast();
  const [now] = useState(() => Date.now());

  useEffect(() => {
    if (revoked.message) toast({ title: revoked.message, tone: revoked.ok ? "success" : "error" });
  }, [revoked, toast]);
  useEffect(() => {
    if (mailed.ok && mailed.message) toast({ title: mailed.message, tone: "success" });
  }, [mailed, toast]);

  return (
    <div className="flex flex-col gap-5">
      {canShare ? (
        <form action={createAction} className="flex flex-wrap items-end gap-3">
          <input type="hidden" name="checkId" value={checkId} />
          <Field label="Link works for" className="w-56" error={created.fieldErrors?.expiresInDays?.[0]}>
            <Select name="expiresInDays" defaultValue="">
              <option value="">{`The usual ${usualDays} days`}</option>
              <option value="7">7 days</option>
              <option value="30">30 days</option>
              <option value="90">90 days</option>
              <option value="365">A year</option>
            </Select>
          </Field>
          <Button type="submit" loading={creating} icon={<Link2 aria-hidden="true" className="size-4" />}>
            Make a customer link
          </Button>
        </form>
      ) : (
        <p className="text-sm text-ink-soft">Your role can read this check but not share it.</p>
      )}
      {created.ok === false && created.message ? <FormMessage tone="error">{created.message}</FormMessage> : null}

      {created.ok && created.url ? (
        <div className="grid gap-4 rounded-md border border-accent/40 bg-accent-soft/50 p-4 sm:grid-cols-[9rem_1fr]" data-testid="new-link">
          <div
            className="size-36 rounded-md bg-white p-2 [&_svg]:h-full [&_svg]:w-full"
            role="img"
            aria-label="QR code of the customer link"
            dangerouslySetInnerHTML={{ __html: created.qrSvg ?? "" }}
          />
          <div className="flex min-w-0 flex-col gap-3">
            <div>
              <p className="text-sm font-medium text-ink">The customer&rsquo;s link</p>
              <p className="text-xs text-ink-soft">Shown once: Towmargin keeps only a fingerprint of it. Scan the code, copy it, or mail it now.</p>
            </div>
            <div className="flex min-w-0 gap-2">
              <TextInput readOnly value={created.url} aria-label="Customer link" className="font-mono text-xs" onFocus={(e) => e.currentTarget.select()} />
              <Button
                variant="secondary"
                aria-label="Copy the link"
                onClick={async () => {
                  await navigator.clipboard?.writeText(created.url!).catch(() => undefined);
                  toast({ title: "Link copied.", tone: "success" });
                }}
              >
                <Copy aria-hidden="true" className="size-4" />
              </Button>
            </div>
            <form action={mailAction} className="flex flex-wrap items-end gap-2">
              <input type="hidden" name="checkId" value={checkId} />
              <input type="hidden" name="token" value={created.token} />
              <Field label="Customer's e-mail" className="min-w-56 flex-1" error={mailed.fieldErrors?.email?.[0]}>
                <TextInput type="email" name="email" defaultValue={defaultEmail} autoComplete="off" />
              </Field>
              <Button type="submit" variant="secondary" loading={mailing} icon={<Mail aria-hidden="true" className="size-4" />}>
                E-mail the link
              </Button>
            </form>
            {mailed.ok === false && mailed.message && !mailed.fieldErrors ? <FormMessage tone="error">{mailed.message}</FormMessage> : null}
          </div>
        </div>
      ) : null}

      <Table caption="Customer links of this check" hideCaption>
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
            const open = !state.startsWith("Withdrawn") && !state.startsWith("Expired");
            return (
              <TR key={link.id}>
                <TD className="font-mono text-xs">…{link.tokenHint}</TD>
                <TD>{day.format(new Date(link.createdAt))}</TD>
                <TD>{state}</TD>
                <TD className="text-ink-soft">{link.lastOpenedAt ? day.format(new Date(link.lastOpenedAt)) : "Not yet"}</TD>
                <TD className="text-right">
                  {open && canShare ? (
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
