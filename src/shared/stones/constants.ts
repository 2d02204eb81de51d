// Names and lists of the stones domain, shared by the tables, the schemas and the screens.
export const ABRASIVES = ["aluminium_oxide", "silicon_carbide", "diamond", "cbn", "plateau_brush"] as const;
export type Abrasive = (typeof ABRASIVES)[number];
export const ABRASIVE_LABELS: Record<Abrasive, string> = {
  aluminium_oxide: "Aluminium oxide",
  silicon_carbide: "Silicon carbide",
  diamond: "Diamond",
  cbn: "CBN",
  plateau_brush: "Plateau brush / tool",
};

export const GRIT_SCALE_IDS = ["FEPA-F", "JIS", "ANSI", "FEPA-P", "D", "B"] as const;

export const STONE_ROLES = ["coarse", "finish", "plateau"] as const;
export type StoneRoleName = (typeof STONE_ROLES)[number];
export const STONE_ROLE_LABELS: Record<StoneRoleName, string> = { coarse: "Coarse", finish: "Finish", plateau: "Plateau" };

export const STROKE_DRIVES = ["constant", "crank"] as const;
export const DRIVE_LABELS: Record<(typeof STROKE_DRIVES)[number], string> = {
  constant: "Constant speed",
  crank: "Crank (sinusoidal)",
};

export const PRESSURE_UNITS = ["bar", "dial", "N"] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export const PRESSURE_UNIT_LABELS: Record<PressureUnit, string> = { bar: "bar", dial: "dial setting", N: "N" };

export const RATE_SOURCES = ["shop_measurement", "maker_data_sheet", "demo"] as const;
export type RateSource = (typeof RATE_SOURCES)[number];
export const RATE_SOURCE_LABELS: Record<RateSource, string> = {
  shop_measurement: "Shop measurement",
  maker_data_sheet: "Maker's data sheet",
  demo: "Demo data",
};

export const CLEANUP_MODES = ["explicit", "from_rz"] as const;
/** Clean-up stock = 2 sides × this × Rz when no explicit figure is given [C, DESIGN §5.3]. */
export const DEFAULT_CLEANUP_RZ_MULTIPLE = 3;

export const CHANGE_KINDS = ["create", "update", "retire", "reactivate", "restore"] as const;
export type ChangeKind = (typeof CHANGE_KINDS)[number];

/** A stone set whose height left above its wear limit is at most this share of its usable height. */
export const NEAR_WEAR_LIMIT_FRACTION = 0.2;
