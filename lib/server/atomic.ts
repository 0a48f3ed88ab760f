import "server-only";
// A transaction whose steps answer with a Result: the first refusal rolls every earlier write back
// (an invitation consumed, a seat taken) and is returned as the answer; only bugs throw through.
import type { Database, Queryable } from "@/db/client";
import type { Failure, Result } from "./errors";

class Refused extends Error {
  constructor(readonly failure: Failure) {
    super(failure.code);
  }
}

export async function atomically<T extends object>(database: Database, work: (tx: Queryable) => Promise<Result<T>>): Promise<Result<T>> {
  try {
    return await database.transaction(async (tx) => {
      const result = await work(tx);
      if (!result.ok) throw new Refused(result);
      return result;
    });
  } catch (err) {
    if (err instanceof Refused) return err.failure;
    throw err;
  }
}
