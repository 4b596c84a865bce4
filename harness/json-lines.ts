import { createInterface } from 'node:readline';

/**
 * Reads JSON lines from `input` and writes one answer line per non-blank input line,
 * in order. A line that is not JSON is answered with `{"error": ...}` and the stream goes on.
 */
export async function jsonLines(
  input: NodeJS.ReadableStream,
  output: NodeJS.WritableStream,
  answer: (request: unknown) => unknown,
): Promise<void> {
  const lines = createInterface({ input, crlfDelay: Infinity });
  for await (const line of lines) {
    if (line.trim() === '') continue;
    let reply: unknown;
    try {
      reply = answer(JSON.parse(line));
    } catch (e) {
      reply = {
        error: e instanceof SyntaxError ? `not JSON: ${e.message}` : e instanceof Error ? e.message : String(e),
      };
    }
    output.write(JSON.stringify(reply) + '\n');
  }
}
