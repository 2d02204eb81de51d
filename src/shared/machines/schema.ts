// Input of a honing machine, shared by the form and the server.
import { z } from "zod";
import { PRESSURE_UNITS, STROKE_DRIVES } from "@/shared/stones/constants";
import { LIMITS, PRESSURE_LIMITS } from "@/shared/limits";
import { checkbox, id, integerIn, lengthUm, numberIn, withPressureUnits } from "@/shared/fields";
import { notes, reason } from "@/shared/stones/fields";

const M = LIMITS;
const machineFields = z.object({
  name: z.string().trim().min(1, "Name the machine.").max(80, "Keep the name under 80 characters."),
  spindleRpmMin: integerIn("Lowest spindle speed", M.spindleRpm, "rpm"),
  spindleRpmMax: integerIn("Highest spindle speed", M.spindleRpm, "rpm"),
  doubleStrokesPerMinMin: numberIn("Lowest stroke rate", M.doubleStrokesPerMin, "double strokes/min"),
  doubleStrokesPerMinMax: numberIn("Highest stroke rate", M.doubleStrokesPerMin, "double strokes/min"),
  maxStrokeLengthUm: lengthUm("Maximum stroke", M.maxStrokeLengthUm),
  drive: z.enum(STROKE_DRIVES, { error: "Choose constant speed or crank." }),
  pressureUnit: z.enum(PRESSURE_UNITS, { error: "Choose bar, dial or N." }),
  pressureMin: numberIn("Lowest feed pressure", M.feedPressure),
  pressureMax: numberIn("Highest feed pressure", M.feedPressure),
  headStoneLengthUm: lengthUm("Head stone length", M.headStoneLengthUm),
  notes,
});

type MachineCheck = z.output<typeof machineFields>;
function checkRanges(v: MachineCheck, ctx: z.RefinementCtx) {
  if (v.spindleRpmMin > v.spindleRpmMax) {
    ctx.addIssue({ code: "custom", path: ["spindleRpmMax"], message: "The highest spindle speed must not be below the lowest." });
  }
  if (v.doubleStrokesPerMinMin > v.doubleStrokesPerMinMax) {
    ctx.addIssue({ code: "custom", path: ["doubleStrokesPerMinMax"], message: "The highest stroke rate must not be below the lowest." });
  }
  const p = PRESSURE_LIMITS[v.pressureUnit];
  for (const key of ["pressureMin", "pressureMax"] as const) {
    if (v[key] < p.min || v[key] > p.max) {
      ctx.addIssue({ code: "custom", path: [key], message: `Feed pressure must be ${p.min} to ${p.max} ${v.pressureUnit}.` });
    }
  }
  if (v.pressureMin > v.pressureMax) {
    ctx.addIssue({ code: "custom", path: ["pressureMax"], message: "The highest feed pressure must not be below the lowest." });
  }
  if (v.headStoneLengthUm >= v.maxStrokeLengthUm) {
    ctx.addIssue({ code: "custom", path: ["headStoneLengthUm"], message: "The head's stone length must be shorter than the maximum stroke." });
  }
}

const pressureTyped = <T extends z.ZodType>(schema: T) => withPressureUnits(schema, ["pressureMin", "pressureMax"], "pressureUnit");
export const machineInputSchema = pressureTyped(machineFields.superRefine(checkRanges));
export type MachineFormInput = z.output<typeof machineInputSchema>;
export const createMachineSchema = machineInputSchema;
export const updateMachineSchema = pressureTyped(machineFields.extend({ machineId: id }).superRefine(checkRanges));
export const setMachineActiveSchema = z.object({ machineId: id, active: checkbox, reason: reason.optional() });
