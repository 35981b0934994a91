/**
 * What a server serialiser may build for a contract type T: the same shape, except that a Date may stand where
 * the wire carries a string, since res.json turns it into its ISO string (Date#toJSON). Serialisers end in
 * `satisfies Sent<T>`, so a field the contract names and the builder drops, or one it adds, fails the typecheck.
 */
export type Sent<T> = T extends string ? T | Date : T extends readonly (infer U)[] ? readonly Sent<U>[] : T extends object ? { [K in keyof T]: Sent<T[K]> } : T;
