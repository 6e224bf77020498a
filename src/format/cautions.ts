/**
 * The cautions every result is shown with, in the project's words (docs/physics.md,
 * "Cautions"). Screens, the report and `solve` all print this same list.
 */
export const CAUTIONS: readonly string[] = [
  'These figures are estimates for trained investigators; each is a minimum, not the speed.',
  'They depend on the drag factor, on correct scene measurement and on the vehicle’s condition; verify the drag factor on scene where possible.',
  'Speed lost before the marks began, and energy taken by an impact, are not counted.',
  'Follow your agency’s procedures, local law and rules of evidence; a result offered in court needs a qualified reconstructionist or licensed engineer to stand behind it.',
  'This tool does not state fault.',
];
