/**
 * Sizes of an image upload, in bytes. Kept free of imports so that the HTTP
 * server (scripts/support/serve-app.ts) can size its body cut-off from them
 * without loading the models.
 */

/** The largest image a memo may carry (NODEWRIGHT_MAX_IMAGE_BYTES, default 5 MiB). */
export const MAX_IMAGE_BYTES = Number(process.env.NODEWRIGHT_MAX_IMAGE_BYTES ?? 5 * 1024 * 1024);

/** Room for the multipart boundaries and part headers around one image. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

/** The most an upload request may carry: one image at its limit plus multipart framing. */
export const MAX_UPLOAD_BODY_BYTES = MAX_IMAGE_BYTES + MULTIPART_OVERHEAD_BYTES;
