import { BORE_MATERIALS } from "@/lib/bore-materials";
import { buttonClass } from "@/components/ui/button";
import { CAPABILITY_BORES } from "@/shared/runs/log-schema";

type Choice = { id: string; label: string };
const field = "flex flex-col gap-1 text-caption text-ink-soft";
const input = "min-h-touch rounded border border-rule bg-paper px-2 text-body text-ink";

function Select({ name, label, choices, value }: { name: string; label: string; choices: Choice[]; value: string | undefined }) {
  return (
    <label className={field}>
      {label}
      <select name={name} defaultValue={value ?? ""} className={input} data-testid={`filter-${name}`}>
        <option value="">Any</option>
        {choices.map((c) => <option key={c.id} value={c.id}>{c.label}</option>)}
      </select>
    </label>
  );
}

/** A plain GET form: the query string is the filter, read by the server with runLogSchema. */
export function RunFilters({ choices, values }: { choices: { stones: Choice[]; machines: Choice[]; people: Choice[] }; values: Record<string, string> }) {
  return (
    <form method="get" action="/runs" className="grid grid-cols-2 gap-3 rounded-lg border border-rule bg-paper-raised p-4 md:grid-cols-4 lg:grid-cols-8" data-testid="run-filters">
      <Select name="stone" label="Stone" choices={choices.stones} value={values.stone} />
      <Select name="machine" label="Machine" choices={choices.machines} value={values.machine} />
      <Select name="material" label="Bore material" choices={BORE_MATERIALS.map((m) => ({ id: m.code, label: m.label }))} value={values.material} />
      <Select name="person" label="Logged by" choices={choices.people} value={values.person} />
      <label className={field}>From<input type="date" name="from" defaultValue={values.from ?? ""} className={input} /></label>
      <label className={field}>To<input type="date" name="to" defaultValue={values.to ?? ""} className={input} /></label>
      <label className={field}>
        Capability over (bores)
        <input type="number" name="bores" min={CAPABILITY_BORES.min} max={CAPABILITY_BORES.max} step={1} defaultValue={values.bores ?? String(CAPABILITY_BORES.default)} className={`${input} num`} />
      </label>
      <div className="flex items-end"><button type="submit" className={buttonClass("primary")} data-testid="apply-filters">Show</button></div>
    </form>
  );
}
