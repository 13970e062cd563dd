/** Limits of a lab-test upload, shared by the parser, the route and the form's hints. */

/** The largest CSV accepted: 2 MiB, written "2 MB" in messages. */
export const MAX_FILE_BYTES = 2 * 1024 * 1024;

/** The multipart envelope (boundaries, the other fields) on top of the file. */
export const UPLOAD_BODY_LIMIT = MAX_FILE_BYTES + 64 * 1024;

/** Data rows after the header; a test logged at 100 Hz for eight minutes fits. */
export const MAX_DATA_ROWS = 50_000;

/** Fewer points than this in the fitted range do not pin down a curve and its R². */
export const MIN_FIT_POINTS = 5;

/**
 * The small-deformation range fitted: total plate travel up to 5 % of the sample's diameter.
 * Hertz theory holds only while the contact stays small against the body; a fixed fraction of
 * the size also compares samples at like deformation, as ASAE/ASABE S368 asks.
 */
export const FIT_STRAIN = 0.05;

/** Written thousands with a thin space, as the messages show them: 50 000. */
export function groupDigits(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
}
