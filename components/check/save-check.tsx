"use client";

/** The check screen's "Save check" card: customer name and note (both optional), then the saved check's link. */
import { useState, type FormEvent } from "react";
import Link from "next/link";
import { Save } from "lucide-react";
import { Button, Card, CardBody, CardHeader, Field, FormMessage, TextInput, Textarea } from "@/components/ui";
import type { RigInput } from "@/lib/towing";
import type { Place } from "@/lib/towing/rules/types";

export type ActionResult = { ok: boolean; message?: string; fieldErrors?: Record<string, string[]> };

export interface SaveCheckInput {
  rig: RigInput;
  customerName?: string;
  note?: string;
  place?: Place | null;
}

export type SaveCheckHandler = (input: SaveCheckInput) => Promise<ActionResult & { checkId?: string }>;

export function SaveCheck({ onSave, getRig }: { onSave: SaveCheckHandler; getRig: () => RigInput | null; }) {
  const [customerName, setCustomerName] = useState("");
  const [note, setNote] = useState("");
  const [pending, setPending] = useState(false);
  const [state, setState] = useState<(ActionResult & { checkId?: string }) | null>(null);

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const rig = getRig();
    if (!rig) {
      setState({ ok: false, message: "Some figures are not valid yet: fix the fields marked in red, then save." });
      return;
    }
    setPending(true);
    try {
      const answer = await onSave({ rig, customerName: customerName.trim() || undefined, note: note.trim() || undefined });
      setState(answer);
    } catch {
      setState({ ok: false, message: "The check could not be saved. Try again in a moment." });
    } finally {
      setPending(false);
    }
  };
  const errorOf = (key: string) => state?.fieldErrors?.[key]?.[0];

  return (
    <Card as="section" id="workbench-save" aria-labelledby="workbench-save-title" className="min-w-0 scroll-mt-32 lg:col-start-1 lg:scroll-mt-16">
      <CardHeader titleId="workbench-save-title" title="Save check" description="Keeps the figures and the verdict, for the customer's page and for later." />
      <CardBody>
        <form onSubmit={submit} noValidate className="space-y-4">
          <div className="grid gap-4 sm:grid-cols-2">
            <Field label="Customer name (optional)" error={errorOf("customerName")}>
              <TextInput value={customerName} onChange={(e) => setCustomerName(e.target.value)} autoComplete="off" maxLength={200} />
            </Field>
            <Field label="Note (optional)" error={errorOf("note")} className="sm:col-span-2">
              <Textarea value={note} onChange={(e) => setNote(e.target.value)} rows={2} maxLength={2000} />
            </Field>
          </div>
          <FormMessage tone={state?.ok ? "success" : "error"}>
            {state?.ok ? (
              <>
                Check saved.{" "}
                {state.checkId ? (
                  <Link href={`/checks/${state.checkId}`} className="font-semibold text-accent-strong underline">
                    Open the saved check
                  </Link>
                ) : null}
              </>
            ) : state?.message ? (
              state.message
            ) : state && state.fieldErrors ? (
              "Some figures need a look before this can be saved."
            ) : null}
          </FormMessage>
          <Button type="submit" loading={pending} icon={<Save />}>
            Save check
          </Button>
        </form>
      </CardBody>
    </Card>
  );
}
