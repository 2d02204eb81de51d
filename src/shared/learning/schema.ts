import { z } from "zod";
import { id } from "@/shared/fields";
import { expectedVersion, reason } from "@/shared/stones/fields";

/** Adopt: the lead writes one machine's learned rate into the rate row, as its next version, with a reason. */
export const adoptLearnedSchema = z.object({ rateRowId: id, machineId: id, expectedVersion, reason });
export type AdoptLearnedInput = z.infer<typeof adoptLearnedSchema>;
