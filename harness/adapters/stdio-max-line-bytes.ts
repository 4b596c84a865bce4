/**
 * The longest line the harness reads from a stdio program (docs/stdio-protocol.md): a line this
 * long is not an answer. cmath answers a seeded 1,000-item batch in 50,812 bytes (measured), so the
 * harness's largest slice (20,000 points) in ~1 MB; 16 MB stops a runaway writer long before it
 * fills memory. Used by stdio-target.ts and by adapter-check, which judges a program by the harness's limits.
 */
export const STDIO_MAX_LINE_BYTES = 16 * 1024 * 1024;
