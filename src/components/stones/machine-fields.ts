import type { LibraryField } from "@/components/stones/library-form";
import { PRESSURE_UNITS, STROKE_DRIVES } from "@/shared/stones/constants";
import { DRIVE_LABELS, PRESSURE_UNIT_LABELS } from "@/shared/stones/constants";
import { METRIC, plain } from "@/shared/units";
import type { MachineView } from "@/server/machines/queries";
import type { DisplayUnits } from "@/shared/units";
import { lengthField } from "./field-specs";

export function machineFieldSpecs(m?: MachineView, units: DisplayUnits = METRIC): LibraryField[] {
  const speeds = "Speeds the machine can run";
  const head = "Stroke, feed pressure and head";
  return [
    { name: "name", label: "Name", defaultValue: m?.name ?? "", wide: true, hint: "How the shop calls it, e.g. Bay 1 vertical hone" },
    { name: "spindleRpmMin", label: "Lowest spindle speed", kind: "number", unit: "rpm", defaultValue: plain(m?.spindleRpmMin, 0), group: speeds },
    { name: "spindleRpmMax", label: "Highest spindle speed", kind: "number", unit: "rpm", defaultValue: plain(m?.spindleRpmMax, 0), group: speeds },
    { name: "drive", label: "Stroke drive", kind: "select", options: STROKE_DRIVES.map((d) => ({ value: d, label: DRIVE_LABELS[d] })), defaultValue: m?.drive ?? "constant", group: speeds },
    { name: "doubleStrokesPerMinMin", label: "Lowest stroke rate", kind: "number", unit: "double strokes/min", defaultValue: plain(m?.doubleStrokesPerMinMin, 1), group: speeds },
    { name: "doubleStrokesPerMinMax", label: "Highest stroke rate", kind: "number", unit: "double strokes/min", defaultValue: plain(m?.doubleStrokesPerMinMax, 1), group: speeds, hint: "One double stroke = up and down" },
    { name: "maxStrokeLengthUm", label: "Maximum stroke", ...lengthField(units, m?.maxStrokeLengthUm), group: head },
    { name: "headStoneLengthUm", label: "Head stone length", ...lengthField(units, m?.headStoneLengthUm), group: head },
    { name: "pressureUnit", label: "Feed pressure is set in", kind: "select", options: PRESSURE_UNITS.map((u) => ({ value: u, label: PRESSURE_UNIT_LABELS[u] })), defaultValue: m?.pressureUnit ?? "bar", group: head },
    { name: "pressureMin", label: "Lowest feed pressure", kind: "number", hint: "In the unit above; in bar you may type psi, kPa or MPa", defaultValue: plain(m?.pressureMin, 2), group: head },
    { name: "pressureMax", label: "Highest feed pressure", kind: "number", hint: "e.g. 12 bar or 175 psi", defaultValue: plain(m?.pressureMax, 2), group: head },
    { name: "notes", label: "Notes", kind: "textarea", wide: true, defaultValue: m?.notes ?? "", group: head },
  ];
}
