// The machining record's fixed words and limits (issue 14).

/** The remarks a shop's record carries until it writes its own (record settings). */
export const DEFAULT_RECORD_REMARKS =
  "Clean the bores before assembly. Follow the piston and ring makers' instructions for ring gaps, assembly and run-in. " +
  "Figures are the final readings at 20 °C with the gauge set to its master.";

/**
 * The customer's link lives 90 days: long enough for the block to be assembled, run in and questioned
 * while the engine is new; the PDF in the mail keeps the record for good, and a new send makes a
 * fresh link. Revocable at any time from the job's Records panel.
 */
export const RECORD_LINK_DAYS = 90;
export const RECORD_LINK_MS = RECORD_LINK_DAYS * 24 * 60 * 60 * 1000;
