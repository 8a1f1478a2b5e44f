"use client";
/** Choose the place one check is read for: the organisation's own, another, or none. */
import { Field, Select } from "@/components/ui";
import { COUNTRIES, placeLabel } from "@/lib/towing/rules/place-list";
import type { Place } from "@/lib/towing/rules/types";

export type PlaceChoice = Place | null;

function code(place: PlaceChoice): string {
  if (!place) return "";
  return place.region ? `${place.country}-${place.region}` : place.country;
}

function fromCode(value: string): PlaceChoice {
  if (!value) return null;
  const [country, ...rest] = value.split("-");
  return rest.length ? { country: country!, region: rest.join("-") } : { country: country! };
}

export function PlacePicker({ value, home, onChange }: { value: PlaceChoice; home?: Place; onChange: (place: PlaceChoice) => void }) {
  return (
    <Field
      label="Rules of"
      className="w-full sm:w-72"
      help={home ? `Your organisation works in ${placeLabel(home)}; choose another place for a customer towing elsewhere.` : "Set where you work on the settings page; or choose a place for this check."}
    >
      <Select value={code(value)} onChange={(e) => onChange(fromCode(e.target.value))}>
        <option value="">No local rules</option>
        {COUNTRIES.map((c) =>
          c.regions.length ? (
            <optgroup key={c.code} label={c.name}>
              {c.regions.map((r) => (
                <option key={r.code} value={`${c.code}-${r.code}`}>
                  {r.name}
                </option>
              ))}
            </optgroup>
          ) : (
            <option key={c.code} value={c.code}>
              {c.name}
            </option>
          ),
        )}
      </Select>
    </Field>
  );
}
