// How each versioned field of the stone library is named and shown in its history (units: src/shared/units.ts).
import { boreMaterialLabel, type BoreMaterial } from "@/lib/bore-materials";
import { METRIC, length, micro, plain, type DisplayUnits } from "@/shared/units";
import { ABRASIVE_LABELS, PRESSURE_UNIT_LABELS, RATE_SOURCE_LABELS, STONE_ROLE_LABELS } from "@/shared/stones/constants";

type Formatter = (v: unknown, units: DisplayUnits) => string;
const asNumber = (f: (n: number, units: DisplayUnits) => string): Formatter => (v, units) => (v === null || v === undefined ? "—" : f(Number(v), units));
const asLength = (mmDecimals: number): Formatter => asNumber((n, units) => length(n, units, mmDecimals));
const label = (labels: Record<string, string>): Formatter => (v) => labels[String(v)] ?? String(v ?? "—");

/** How each versioned field is named and shown in the history. */
export const FIELD_DISPLAY: Record<string, { label: string; show: Formatter }> = {
  code: { label: "Code", show: (v) => String(v) },
  role: { label: "Role", show: label(STONE_ROLE_LABELS) },
  abrasive: { label: "Abrasive", show: label(ABRASIVE_LABELS) },
  gritScale: { label: "Grit scale", show: (v) => String(v) },
  gritNumber: { label: "Grit number", show: (v) => String(v) },
  bond: { label: "Bond", show: (v) => String(v) },
  stoneLengthUm: { label: "Stone length", show: asLength(1) },
  stoneWidthUm: { label: "Stone width", show: asLength(1) },
  stonesPerHead: { label: "Stones per head", show: (v) => String(v) },
  startHeightUm: { label: "Starting height", show: asLength(2) },
  wearLimitHeightUm: { label: "Wear limit", show: asLength(2) },
  currentHeightUm: { label: "Current height", show: asLength(2) },
  notes: { label: "Notes", show: (v) => (v ? String(v) : "—") },
  active: { label: "In use", show: (v) => (v ? "yes" : "retired") },
  boreMaterial: { label: "Bore material", show: (v) => boreMaterialLabel(v as BoreMaterial) },
  removalPerDoubleStrokeUm: { label: "Removal per double stroke", show: asNumber((n) => micro(n, 3)) },
  referencePressure: { label: "Reference pressure", show: asNumber((n) => plain(n, 2)) },
  referencePressureUnit: { label: "Pressure unit", show: label(PRESSURE_UNIT_LABELS) },
  referenceBoreLengthUm: { label: "Reference bore length", show: asLength(1) },
  raUm: { label: "Ra", show: asNumber((n) => micro(n)) },
  rzUm: { label: "Rz", show: asNumber((n) => micro(n)) },
  rkUm: { label: "Rk", show: asNumber((n) => micro(n)) },
  rpkUm: { label: "Rpk", show: asNumber((n) => micro(n)) },
  rvkUm: { label: "Rvk", show: asNumber((n) => micro(n)) },
  cleanupMode: { label: "Clean-up rule", show: (v) => (v === "explicit" ? "explicit stock" : "from Rz") },
  cleanupStockUm: { label: "Clean-up stock", show: asNumber((n) => micro(n, 1)) },
  cleanupRzMultiple: { label: "Rz multiple", show: asNumber((n) => `${plain(n, 2)} × Rz`) },
  wearUmPerUmStock: { label: "Stone wear", show: asNumber((n) => `${plain(n, 4)} µm per µm`) },
  uncertaintyFraction: { label: "Uncertainty (fraction of the rate)", show: asNumber((n) => `± ${plain(n, 3)}`) },
  source: { label: "Source", show: label(RATE_SOURCE_LABELS) },
};

export function showField(field: string, value: unknown, units: DisplayUnits = METRIC): string {
  const show = FIELD_DISPLAY[field]?.show;
  return show ? show(value, units) : String(value);
}
export const fieldLabel = (field: string) => FIELD_DISPLAY[field]?.label ?? field;

