const numeric = (v: string): number[] => v.split(/[.-]/).map((x) => Number(x) || 0);

/** Orders two versions numerically part by part ("2.10.0" after "2.9.1"): negative, zero or positive. */
export function compareVersions(a: string, b: string): number {
  const [x, y] = [numeric(a), numeric(b)];
  for (let i = 0; i < Math.max(x.length, y.length); i++)
    if ((x[i] ?? 0) !== (y[i] ?? 0)) return (x[i] ?? 0) - (y[i] ?? 0);
  return 0;
}
