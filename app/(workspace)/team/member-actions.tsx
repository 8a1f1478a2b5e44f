"use client";
import { startTransition, useActionState, useEffect, useState } from "react";
import { Button, Dialog, Select, useToast } from "@/components/ui";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/roles";
import { initialFormState, type FormState } from "@/lib/validation/form-state";
import { remove, revoke, setRole } from "./actions";

function useAnnounce(state: FormState) {
  const { toast } = useToast();
  useEffect(() => {
    if (state.message) toast({ title: state.message, tone: state.ok ? "success" : "error" });
  }, [state, toast]);
}

export function RoleSelect({ membershipId, role, name }: { membershipId: string; role: Role; name: string }) {
  const [state, formAction, pending] = useActionState(setRole, initialFormState);
  useAnnounce(state);
  return (
    <form action={formAction}>
      <input type="hidden" name="membershipId" value={membershipId} />
      <Select
        name="role"
        aria-label={`Role of ${name}`}
        defaultValue={role}
        key={`${role}-${state.ok}`}
        disabled={pending}
        className="h-9 text-sm"
        wrapperClassName="w-44"
        onChange={(event) => {
          const data = new FormData();
          data.set("membershipId", membershipId);
          data.set("role", event.currentTarget.value);
          startTransition(() => formAction(data));
        }}
      >
        {ROLES.map((value) => (
          <option key={value} value={value}>
            {ROLE_LABELS[value]}
          </option>
        ))}
      </Select>
      <noscript>
        <Button type="submit" size="sm" variant="secondary">
          Save
        </Button>
      </noscript>
    </form>
  );
}

export function RemoveMember({ membershipId, name }: { membershipId: string; name: string }) {
  const [open, setOpen] = useState(false);
  const [state, formAction, pending] = useActionState(remove, initialFormState);
  useAnnounce(state);
  // A finished removal closes the dialog: adjusted while rendering, the way React suggests for state that follows
  // another state, rather than in an effect that would draw the open dialog once more.
  const [handled, setHandled] = useState(state);
  if (state !== handled) {
    setHandled(state);
    if (state.message) setOpen(false);
  }
  return (
    <>
      <Button size="sm" variant="quiet" onClick={() => setOpen(true)}>
        Remove
      </Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title={`Remove ${name}?`}
        description="They lose access to this organisation at once. Their account stays, and you can invite them again."
        footer={
          <form action={formAction} className="flex gap-2">
            <Button type="button" variant="secondary" onClick={() => setOpen(false)}>
              Keep
            </Button>
            <input type="hidden" name="membershipId" value={membershipId} />
            <Button type="submit" variant="danger" loading={pending}>
              Remove
            </Button>
          </form>
        }
      />
    </>
  );
}

export function RevokeInvitation({ invitationId, email }: { invitationId: string; email: string }) {
  const [state, formAction, pending] = useActionState(revoke, initialFormState);
  useAnnounce(state);
  return (
    <form action={formAction}>
      <input type="hidden" name="invitationId" value={invitationId} />
      <Button type="submit" size="sm" variant="quiet" loading={pending} aria-label={`Withdraw the invitation to ${email}`}>
        Withdraw
      </Button>
    </form>
  );
}
