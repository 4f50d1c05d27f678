import { IntakeFileError } from './intake-file.error';

/** Control characters that never occur in CSV text (tab, line feed and carriage return are allowed). */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const binaryCharacter = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

function formatMegabytes(bytes: number): string {
  return `${new Intl.NumberFormat('en', { maximumFractionDigits: 1 }).format(bytes / 1_048_576)} MB`;
}

function startsWith(bytes: Buffer, signature: readonly number[]): boolean {
  return signature.every((byte, index) => bytes[index] === byte);
}

/**
 * Decode CSV text — checks that an uploaded file is UTF-8 text of an acceptable size and returns
 * it as a string without its byte-order mark.
 *
 * Purpose: the first gate of Intake. Refusals name what the file seems to be instead
 * ("an Excel workbook", "UTF-16 text", "binary data") so the uploader knows to use "Save as CSV
 * UTF-8". Only UTF-8 is read: a byte that is not valid UTF-8 (for example a Windows-1252 "é") is
 * refused rather than guessed at.
 * Reference: the Encoding Standard's UTF-8 decoder, https://encoding.spec.whatwg.org/#utf-8-decoder
 * Throws: IntakeFileError with status 413 when the file is larger than `maxBytes`, 422 when it is
 * empty, blank, or not UTF-8 text.
 * Example: `decodeCsvText(Buffer.from('\uFEFFplot label\r\n'), { maxBytes: 1000 })` → `'plot label\r\n'`
 */
export function decodeCsvText(bytes: Buffer, { maxBytes }: { maxBytes: number }): string {
  if (bytes.length === 0) throw new IntakeFileError('The file is empty.', 422);
  if (bytes.length > maxBytes) {
    throw new IntakeFileError(
      `The file is ${formatMegabytes(bytes.length)}; files up to ${formatMegabytes(maxBytes)} are accepted. Split it by site or round.`,
      413,
    );
  }
  if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04]) || startsWith(bytes, [0xd0, 0xcf, 0x11, 0xe0])) {
    throw new IntakeFileError('This is a spreadsheet workbook, not a CSV file: save it as "CSV UTF-8" and upload that.', 422);
  }
  if (startsWith(bytes, [0xff, 0xfe]) || startsWith(bytes, [0xfe, 0xff])) {
    throw new IntakeFileError('The file is saved as UTF-16 text: save it as "CSV UTF-8" and upload that.', 422);
  }
  const zeroByte = bytes.indexOf(0);
  if (zeroByte !== -1) {
    throw new IntakeFileError(`The file holds binary data (a zero byte at byte ${zeroByte + 1}), so it is not a CSV text file.`, 422);
  }
  let text: string;
  try {
    // The decoder drops a leading byte-order mark (ignoreBOM: false).
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    throw new IntakeFileError(
      'The file is not UTF-8 text (it may be binary, or saved in an older encoding): save it as "CSV UTF-8" and upload that.',
      422,
    );
  }
  const binary = binaryCharacter.exec(text);
  if (binary) {
    throw new IntakeFileError(`The file holds binary data (a control character at character ${binary.index + 1}), so it is not a CSV text file.`, 422);
  }
  if (text.trim() === '') throw new IntakeFileError('The file holds only blank lines.', 422);
  return text;
}
