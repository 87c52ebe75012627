/** Size caps of uploads (bytes). A photo for tracing needs no more; a readings CSV is small text. */
export const MAX_IMAGE_BYTES = 10 * 1024 * 1024;
export const MAX_CSV_BYTES = 1024 * 1024;
export const MAX_CSV_ROWS = 5000;
/**
 * The readings import's JSON body: a CSV at its cap grows when sent as a JSON string (a line end or a
 * quote takes two bytes), so the body may be twice the file, plus the other fields. A bigger body answers
 * 413 before it is parsed; the CSV's own cap (413 too) then names the file.
 */
export const MAX_CSV_IMPORT_BODY_BYTES = 2 * MAX_CSV_BYTES + 16 * 1024;
