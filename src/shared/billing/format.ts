import { formatMinor } from "@/lib/billing";

// How money, quantities and rates read on the billing screens and in the print.
export const moneyText = (minor: number, currency: string, digits = 2) => `${formatMinor(minor, digits)} ${currency}`;
export const amountText = (minor: number, digits = 2) => formatMinor(minor, digits);
export const quantityText = (milli: number) => String(milli / 1000);
export const rateText = (bp: number) => `${bp / 100} %`;
/** Minor units as the text a money field shows ("45.50"), so an edited line round-trips exactly. */
export const amountInput = (minor: number, digits = 2) => formatMinor(minor, digits);
