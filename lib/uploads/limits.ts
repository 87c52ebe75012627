/** Size caps of uploads (bytes). A photo for tracing needs no more; a readings CSV is small text. */
export const MAX_IMAGE_BYTES = 10 * 1024 * 1024;
export const MAX_CSV_BYTES = 1024 * 1024;
export const MAX_CSV_ROWS = 5000;
