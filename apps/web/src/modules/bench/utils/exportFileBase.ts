// File names of a version's exports, as the server names them.

/** "Interferer notch", 2 -> "Interferer-notch-v2" (characters other than letters, digits, _ and - become "-"). */
export function exportFileBase(configurationName: string, versionNumber: number): string {
  return `${configurationName.replace(/[^A-Za-z0-9_-]+/g, '-')}-v${versionNumber}`;
}
