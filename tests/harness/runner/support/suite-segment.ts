/** A segment path as a suite writes it, parts as strings ("-0" for a negative zero). */
export function suiteSegment(name: string, from: [string, string], to: [string, string], samples: number) {
  return {
    kind: 'segment' as const,
    name,
    from: { re: from[0], im: from[1] },
    to: { re: to[0], im: to[1] },
    samples,
  };
}
