/**
 * Text a person typed that is shown to other people (names, labels, titles, notes): refuses
 * characters that hide, reorder or garble what is shown. No unit (plain strings).
 *
 * - C0 and C1 control characters (NUL, ESC of ANSI escapes, CR/LF in one-line fields, DEL);
 *   notes may keep line breaks and tabs.
 * - Bidirectional embedding, override and isolate controls (U+202A–U+202E, U+2066–U+2069), which
 *   make "evil\u202Etxt.exe" display as "evilexe.txt" (Unicode Technical Report #36, section 2.1).
 * - Lone UTF-16 surrogates, which cannot be encoded as UTF-8 and come back changed.
 * - Text with nothing visible: only spaces and format characters such as zero-width spaces.
 */

// Ranges written as escapes so the source shows what is refused.
// eslint-disable-next-line no-control-regex
const CONTROL_ONE_LINE = /[\u0000-\u001F\u007F-\u009F]/;
// eslint-disable-next-line no-control-regex
const CONTROL_MULTI_LINE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
/** White space, format characters (zero-width space, joiners, BOM, soft hyphen…) and the invisible separators. */
const INVISIBLE = /[\s\p{Cf}\u115F\u1160\u3164\uFFA0\u2800]/gu;

export interface SafeTextOptions {
  /** Allow line breaks and tabs (notes, descriptions, messages). */
  multiline?: boolean;
  /** Allow the empty string (optional free text). Default false. */
  allowEmpty?: boolean;
}

/** Why `text` cannot be stored as a name or note, or null when it can. */
export function unsafeTextReason(text: string, options: SafeTextOptions = {}): string | null {
  if (LONE_SURROGATE.test(text)) return 'Contains a broken character (a lone UTF-16 surrogate); retype it';
  if ((options.multiline ? CONTROL_MULTI_LINE : CONTROL_ONE_LINE).test(text)) {
    return options.multiline ? 'Contains a control character; use plain text' : 'Contains a control character or line break; use plain text on one line';
  }
  if (BIDI_CONTROL.test(text)) return 'Contains a text-direction override character, which can disguise what is shown';
  if (!options.allowEmpty || text.length > 0) {
    if (text.replace(INVISIBLE, '').length === 0) return text.length === 0 ? 'Cannot be empty' : 'Contains nothing visible';
  }
  return null;
}

/** True when `text` can be stored and shown as given. */
export function isSafeText(text: string, options: SafeTextOptions = {}): boolean {
  return unsafeTextReason(text, options) === null;
}
