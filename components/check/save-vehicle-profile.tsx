"use client";

/** The vehicle card's "Save vehicle as profile" button and its dialog asking for the profile's name. */
import { useState, type FormEvent } from "react";
import { UserRound } from "lucide-react";
import { Button, Dialog, Field, FormMessage, TextInput } from "@/components/ui";
import type { RigInput } from "@/lib/towing";
import type { ActionResult } from "./save-check";

/** What a vehicle profile keeps: the vehicle's ratings, lengths and load, with the hitch. */
export type VehicleProfilePart = Pick<RigInput, "units" | "vehicle" | "hitch" | "load">;

export type SaveVehicleProfileHandler = (input: { name: string; rig: VehicleProfilePart }) => Promise<ActionResult>;

export function SaveVehicleProfile({ onSave, getPart }: { onSave: SaveVehicleProfileHandler; getPart: () => VehicleProfilePart | null; }) {
  const [open, setOpen] = useState(false);
  const [name, setName] = useState("");
  const [pending, setPending] = useState(false);
  const [state, setState] = useState<ActionResult | null>(null);
  const [saved, setSaved] = useState<string | null>(null);

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!name.trim()) {
      setState({ ok: false, fieldErrors: { name: ["Give the profile a name."] } });
      return;
    }
    const part = getPart();
    if (!part) {
      setState({ ok: false, message: "Some vehicle or hitch figures are not valid yet." });
      return;
    }
    setPending(true);
    try {
      const answer = await onSave({ name: name.trim(), rig: part });
      setState(answer);
      if (answer.ok) {
        setSaved(name.trim());
        setOpen(false);
        setName("");
      }
    } catch {
      setState({ ok: false, message: "The profile could not be saved. Try again in a moment." });
    } finally {
      setPending(false);
    }
  };

  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button variant="secondary" size="sm" icon={<UserRound />} onClick={() => { setState(null); setOpen(true); }}>
        Save vehicle as profile
      </Button>
      {saved ? <p role="status" className="text-sm text-within">Saved as “{saved}”.</p> : null}
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title="Save vehicle as profile"
        description="The vehicle's ratings, lengths and load, with the hitch, to pick again next time."
        closeOnBackdrop={false}
      >
        <form onSubmit={submit} noValidate className="space-y-4">
          <Field label="Profile name" error={state?.fieldErrors?.name?.[0]} required>
            <TextInput value={name} onChange={(e) => setName(e.target.value)} autoFocus maxLength={120} />
          </Field>
          <FormMessage>{state && !state.ok ? state.message : null}</FormMessage>
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Cancel
            </Button>
            <Button type="submit" loading={pending}>
              Save profile
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}
