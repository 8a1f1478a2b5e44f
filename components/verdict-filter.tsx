import { Field, Select, verdictWords } from "@/components/ui";

const LEVELS = ["within", "tight", "over"] as const;

/** The "Verdict" filter of a list: any, or one of the three levels, in the badges' own words. */
export function VerdictFilter({ value, onChange }: { value: string; onChange: (value: string) => void }) {
  return (
    <Field label="Verdict">
      <Select value={value} onChange={(event) => onChange(event.target.value)}>
        <option value="">Any</option>
        {LEVELS.map((level) => (
          <option key={level} value={level}>
            {verdictWords[level]}
          </option>
        ))}
      </Select>
    </Field>
  );
}
