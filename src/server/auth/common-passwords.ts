import "server-only";
import { COMMON_PASSWORDS } from "./common-passwords-list";

const LIST = new Set(COMMON_PASSWORDS);

/**
 * True for a listed password (ASVS 5.0 V6.2.4 asks for at least the top 3000, web-anchors A2), and for
 * the patterns the list is made of even when not listed: one repeated character, or a password that
 * is only digits in sequence.
 */
export function isCommonPassword(password: string): boolean {
  const lower = password.toLowerCase();
  if (LIST.has(lower)) return true;
  if (/^(.)\1*$/u.test(lower)) return true;
  if (/^\d+$/.test(lower) && isRun(lower)) return true;
  return false;
}

function isRun(digits: string): boolean {
  let ascending = true;
  let descending = true;
  for (let i = 1; i < digits.length; i++) {
    const step = (Number(digits[i]) - Number(digits[i - 1]) + 10) % 10;
    if (step !== 1) ascending = false;
    if (step !== 9) descending = false;
  }
  return ascending || descending;
}
