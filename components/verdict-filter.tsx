import { Field, Select, levelWords } from "@/components/ui";
import { VERDICT_LEVELS as LEVELS } from "@/lib/towing/types";

/** The "Verdict" filter of a list: any, or one of the levels, in the verdict badges' own words. */
export function VerdictFilter({ value, onChange }: { value: string; onChange: (value: string) => void }) {
  return (
    <Field label="Verdict">
      <Select value={value} onChange={(event) => onChange(event.target.value)}>
        <option value="">Any</option>
        {LEVELS.map((level) => (
          <option key={level} value={level}>
            {levelWords[level]}
          </option>
        ))}
      </Select>
    </Field>
  );
}
