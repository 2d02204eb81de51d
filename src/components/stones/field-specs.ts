// Field lists of the stone and rate-row forms, filled from the current values (or sensible blanks).
import type { LibraryField } from "@/components/stones/library-form";
import { BORE_MATERIALS } from "@/lib/bore-materials";
import { ABRASIVES, CLEANUP_MODES, PRESSURE_UNITS, RATE_SOURCES, STONE_ROLES } from "@/shared/stones/constants";
import { ABRASIVE_LABELS, PRESSURE_UNIT_LABELS, RATE_SOURCE_LABELS, STONE_ROLE_LABELS } from "@/shared/stones/constants";
import { METRIC, plain } from "@/shared/units";
import type { RateView, StoneView } from "@/server/stones/queries";
import type { DisplayUnits } from "@/shared/units";

const options = <T extends string>(values: readonly T[], labels: Record<T, string>) => values.map((v) => ({ value: v, label: labels[v] }));
/** A length field in the user's size unit (a bare number means that unit; another unit may be typed). */
export const lengthField = (units: DisplayUnits, defaultUm: number | null | undefined, hint?: string) =>
  ({ kind: "length", lengthUnit: units.size, defaultUm: defaultUm ?? null, hint }) as const;

export function stoneFieldSpecs(s?: StoneView, units: DisplayUnits = METRIC): LibraryField[] {
  return [
    { name: "code", label: "Shop code", defaultValue: s?.code ?? "", hint: "Your own name for the set, e.g. C-150" },
    { name: "role", label: "Role", kind: "select", options: options(STONE_ROLES, STONE_ROLE_LABELS), defaultValue: s?.role ?? "coarse" },
    { name: "abrasive", label: "Abrasive", kind: "select", options: options(ABRASIVES, ABRASIVE_LABELS), defaultValue: s?.abrasive ?? "silicon_carbide" },
    { name: "grit", label: "Grit (scale and number)", defaultValue: s?.gritLabel ?? "", hint: "e.g. JIS #400, F220, P400, ANSI 320, D54 — never a bare number" },
    { name: "bond", label: "Bond", defaultValue: s?.bond ?? "vitrified" },
    { name: "stonesPerHead", label: "Stones per head", kind: "number", defaultValue: String(s?.stonesPerHead ?? 4) },
    { name: "stoneLengthUm", label: "Stone length", ...lengthField(units, s?.stoneLengthUm) },
    { name: "stoneWidthUm", label: "Stone width", ...lengthField(units, s?.stoneWidthUm) },
    { name: "startHeightUm", label: "Starting height", ...lengthField(units, s?.startHeightUm) },
    { name: "wearLimitHeightUm", label: "Wear limit height", ...lengthField(units, s?.wearLimitHeightUm) },
    { name: "currentHeightUm", label: "Current height", ...lengthField(units, s?.currentHeightUm, "As last measured") },
    { name: "notes", label: "Notes", kind: "textarea", wide: true, defaultValue: s?.notes ?? "" },
  ];
}

export function rateFieldSpecs(r?: RateView, withMaterial = false, units: DisplayUnits = METRIC): LibraryField[] {
  const material: LibraryField[] = withMaterial
    ? [{ name: "boreMaterial", label: "Bore material", kind: "select", options: BORE_MATERIALS.filter((m) => m.honable).map((m) => ({ value: m.code, label: m.label })), defaultValue: "grey_iron" }]
    : [];
  const g = { rate: "Removal at reference conditions", finish: "Finish it leaves", after: "Clean-up, wear and source" };
  return [
    ...material.map((f) => ({ ...f, group: g.rate })),
    { name: "removalPerDoubleStrokeUm", label: "Removal per double stroke", kind: "number", unit: "µm", hint: "On diameter, 0.01–50 µm", defaultValue: plain(r?.removalPerDoubleStrokeUm), group: g.rate },
    { name: "referencePressure", label: "Reference feed pressure", kind: "number", hint: "In the unit below; in bar you may type 130 psi or 900 kPa", defaultValue: plain(r?.referencePressure, 2), group: g.rate },
    { name: "referencePressureUnit", label: "Pressure unit", kind: "select", options: options(PRESSURE_UNITS, PRESSURE_UNIT_LABELS), defaultValue: r?.referencePressureUnit ?? "bar", group: g.rate },
    { name: "referenceBoreLengthUm", label: "Reference bore length", ...lengthField(units, r?.referenceBoreLengthUm ?? (units.size === "in" ? 139_700 : 140_000)), group: g.rate },
    { name: "referenceAngleDeg", label: "Crosshatch angle it was measured at", kind: "number", unit: "°", hint: "Included angle, 15–80°; removal per stroke depends on it", defaultValue: plain(r?.referenceAngleDeg) || "45", group: g.rate },
    { name: "referenceDiameterUm", label: "Bore diameter it was measured in (if known)", ...lengthField(units, r?.referenceDiameterUm ?? null), hint: "Empty: the rate is not scaled with diameter", group: g.rate },
    { name: "raUm", label: "Ra", kind: "number", unit: "µm", defaultValue: plain(r?.raUm), group: g.finish },
    { name: "rzUm", label: "Rz", kind: "number", unit: "µm", defaultValue: plain(r?.rzUm), group: g.finish },
    { name: "rkUm", label: "Rk (plateau, if known)", kind: "number", unit: "µm", defaultValue: plain(r?.rkUm), group: g.finish },
    { name: "rpkUm", label: "Rpk (if known)", kind: "number", unit: "µm", defaultValue: plain(r?.rpkUm), group: g.finish },
    { name: "rvkUm", label: "Rvk (if known)", kind: "number", unit: "µm", defaultValue: plain(r?.rvkUm), group: g.finish },
    { name: "cleanupMode", label: "Clean-up stock for the next stage", kind: "select", options: [{ value: "explicit", label: "Explicit stock" }, { value: "from_rz", label: "From Rz (2 × multiple × Rz)" }].filter((o) => CLEANUP_MODES.includes(o.value as never)), defaultValue: r?.cleanupMode ?? "explicit", group: g.after },
    { name: "cleanupStockUm", label: "Clean-up stock (explicit)", kind: "number", unit: "µm", hint: "On diameter", defaultValue: plain(r?.cleanupStockUm, 1), group: g.after },
    { name: "cleanupRzMultiple", label: "Rz multiple (from Rz)", kind: "number", unit: "× Rz", hint: "Default 3", defaultValue: plain(r?.cleanupRzMultiple, 2), group: g.after },
    { name: "wearUmPerUmStock", label: "Stone wear", kind: "number", unit: "µm per µm", hint: "Height lost per µm of diameter stock", defaultValue: plain(r?.wearUmPerUmStock, 4), group: g.after },
    { name: "uncertaintyFraction", label: "Uncertainty (fraction of the rate)", kind: "number", hint: "A fraction, not a percentage: 0.25 means the rate may be a quarter off either way", defaultValue: plain(r?.uncertaintyFraction) || "0.25", group: g.after },
    { name: "source", label: "Source of the numbers", kind: "select", options: options(RATE_SOURCES, RATE_SOURCE_LABELS), defaultValue: r?.source ?? "shop_measurement", group: g.after },
    { name: "notes", label: "Notes", kind: "textarea", wide: true, defaultValue: r?.notes ?? "", group: g.after },
  ];
}

export const reasonField = (defaultValue = ""): LibraryField => ({
  name: "reason", label: "Reason for the change (required)", kind: "textarea", wide: true, defaultValue, group: "Why", hint: "Saved in the history with your name and the time",
});
