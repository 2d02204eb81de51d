// The floor's shop settings (owner and lead): shared by the settings form and the server.
import { z } from "zod";
import { DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K } from "@/lib/honing";
import { numberIn, optionalNumberIn } from "@/shared/fields";
import { GAUGE_TEMPERATURE_LIMITS_C } from "@/shared/floor/schemas";

/**
 * 0.5 K is about what a shop thermometer resolves [common practice]; at 10 K a 94 mm grey-iron bore reads
 * some 10 µm large (α ≈ 11 µm/m·K, engineering handbook tables from memory, see thermal.ts), about a
 * finished bore's whole band, so a wider setting would pass verdicts the warmth decides.
 */
export const TEMPERATURE_DIFFERENCE_LIMITS_K = { min: 0.5, max: 10 } as const;

export type FloorSettings = { maxTemperatureDifferenceK: number; gaugeTemperatureC: number | null };

export const DEFAULT_FLOOR_SETTINGS: FloorSettings = { maxTemperatureDifferenceK: DEFAULT_MAX_TEMPERATURE_DIFFERENCE_K, gaugeTemperatureC: null };

export const floorSettingsSchema = z.object({
  maxTemperatureDifferenceK: numberIn("The temperature difference", TEMPERATURE_DIFFERENCE_LIMITS_K, "K"),
  gaugeTemperatureC: optionalNumberIn("The gauge temperature", GAUGE_TEMPERATURE_LIMITS_C, "°C").transform((v) => v ?? null),
});

export type FloorSettingsInput = z.infer<typeof floorSettingsSchema>;
