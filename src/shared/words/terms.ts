// Product terms with their one definition, shown the same on every form and page (DESIGN.md §5.5:
// the bottom overtravel is limited by the clearance to the crank webs or a blind end).

export const ROOM_BELOW_BORE = {
  label: "Room below the bore",
  hint: "From the bottom of the bore to the crank webs or a blind end: how far the stones may pass the bottom. Empty: no limit.",
} as const;
