/** A pool request as a caller sends it: without the id the pool gives it (Omit applied to each kind of request). */
export type WithoutId<R> = R extends unknown ? Omit<R, 'id'> : never;
