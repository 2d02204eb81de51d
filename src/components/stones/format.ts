// Display of library values: every number with its unit. Lengths of stones and machines in mm,
// removal and roughness in µm (the trade's own units for them).
import { boreMaterialLabel, type BoreMaterial } from "@/lib/bore-materials";
import { ABRASIVE_LABELS, DRIVE_LABELS, PRESSURE_UNIT_LABELS, RATE_SOURCE_LABELS, STONE_ROLE_LABELS } from "@/server/stones/constants";

export const mm = (um: number | null | undefined, decimals = 1) => (um == null ? "—" : `${(um / 1000).toFixed(decimals)} mm`);
export const mmNumber = (um: number | null | undefined, decimals = 1) => (um == null ? "" : (um / 1000).toFixed(decimals));
export const micro = (um: number | null | undefined, decimals = 2) => (um == null ? "—" : `${trim(um, decimals)} µm`);
export const plain = (n: number | null | undefined, decimals = 3) => (n == null ? "" : trim(n, decimals));
function trim(n: number, decimals: number): string {
  return String(Number(n.toFixed(decimals)));
}

type Formatter = (v: unknown) => string;
const asNumber = (f: (n: number) => string): Formatter => (v) => (v === null || v === undefined ? "—" : f(Number(v)));
const label = (labels: Record<string, string>): Formatter => (v) => labels[String(v)] ?? String(v ?? "—");

/** How each versioned field is named and shown in the history. */
export const FIELD_DISPLAY: Record<string, { label: string; show: Formatter }> = {
  code: { label: "Code", show: String },
  role: { label: "Role", show: label(STONE_ROLE_LABELS) },
  abrasive: { label: "Abrasive", show: label(ABRASIVE_LABELS) },
  gritScale: { label: "Grit scale", show: String },
  gritNumber: { label: "Grit number", show: String },
  bond: { label: "Bond", show: String },
  stoneLengthUm: { label: "Stone length", show: asNumber((n) => mm(n)) },
  stoneWidthUm: { label: "Stone width", show: asNumber((n) => mm(n)) },
  stonesPerHead: { label: "Stones per head", show: String },
  startHeightUm: { label: "Starting height", show: asNumber((n) => mm(n, 2)) },
  wearLimitHeightUm: { label: "Wear limit", show: asNumber((n) => mm(n, 2)) },
  currentHeightUm: { label: "Current height", show: asNumber((n) => mm(n, 2)) },
  notes: { label: "Notes", show: (v) => (v ? String(v) : "—") },
  active: { label: "In use", show: (v) => (v ? "yes" : "retired") },
  boreMaterial: { label: "Bore material", show: (v) => boreMaterialLabel(v as BoreMaterial) },
  removalPerDoubleStrokeUm: { label: "Removal per double stroke", show: asNumber((n) => micro(n, 3)) },
  referencePressure: { label: "Reference pressure", show: asNumber((n) => plain(n, 2)) },
  referencePressureUnit: { label: "Pressure unit", show: label(PRESSURE_UNIT_LABELS) },
  referenceBoreLengthUm: { label: "Reference bore length", show: asNumber((n) => mm(n)) },
  raUm: { label: "Ra", show: asNumber((n) => micro(n)) },
  rzUm: { label: "Rz", show: asNumber((n) => micro(n)) },
  rkUm: { label: "Rk", show: asNumber((n) => micro(n)) },
  rpkUm: { label: "Rpk", show: asNumber((n) => micro(n)) },
  rvkUm: { label: "Rvk", show: asNumber((n) => micro(n)) },
  cleanupMode: { label: "Clean-up rule", show: (v) => (v === "explicit" ? "explicit stock" : "from Rz") },
  cleanupStockUm: { label: "Clean-up stock", show: asNumber((n) => micro(n, 1)) },
  cleanupRzMultiple: { label: "Rz multiple", show: asNumber((n) => `${plain(n, 2)} × Rz`) },
  wearUmPerUmStock: { label: "Stone wear", show: asNumber((n) => `${plain(n, 4)} µm per µm`) },
  uncertaintyFraction: { label: "Uncertainty", show: asNumber((n) => `± ${plain(n * 100, 1)} %`) },
  source: { label: "Source", show: label(RATE_SOURCE_LABELS) },
};

export const showField = (field: string, value: unknown) => (FIELD_DISPLAY[field]?.show ?? String)(value);
export const fieldLabel = (field: string) => FIELD_DISPLAY[field]?.label ?? field;

export { ABRASIVE_LABELS, DRIVE_LABELS, PRESSURE_UNIT_LABELS, RATE_SOURCE_LABELS, STONE_ROLE_LABELS };

export function formatWhen(date: Date | string): string {
  const d = typeof date === "string" ? new Date(date) : date;
  return d.toISOString().slice(0, 16).replace("T", " ") + " UTC";
}
