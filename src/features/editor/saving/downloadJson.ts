import { downloadBlob } from '@/lib/download';

/** Offers `value` as a JSON file download (the local copy kept when a save conflict loads theirs). */
export function downloadJson(fileName: string, value: unknown): void {
  downloadBlob(fileName, new Blob([JSON.stringify(value, null, 2)], { type: 'application/json' }));
}

/** "Printer enclosure" → "printer-enclosure". */
export function fileSafeName(name: string): string {
  return name.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'design';
}
