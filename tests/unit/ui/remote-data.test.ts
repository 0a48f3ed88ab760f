// The shared read cache behind the header's account menu and the progress widgets.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { mutateRemote, readRemoteSnapshot, registerFetcher, resetRemoteData, revalidateRemote } from "@/lib/client/remote-data";

beforeEach(() => resetRemoteData());

describe("remote data", () => {
  it("starts loading, then holds the answer", async () => {
    registerFetcher("/api/me", async () => ({ name: "Ade" }));
    expect(readRemoteSnapshot("/api/me")).toMatchObject({ data: undefined, isLoading: true });
    await revalidateRemote("/api/me");
    expect(readRemoteSnapshot("/api/me")).toEqual({ data: { name: "Ade" }, error: undefined, isLoading: false });
  });

  it("sends one request for readers asking at the same time", async () => {
    const fetcher = vi.fn(async () => 1);
    registerFetcher("k", fetcher);
    await Promise.all([revalidateRemote("k"), revalidateRemote("k"), revalidateRemote("k")]);
    expect(fetcher).toHaveBeenCalledTimes(1);
    await revalidateRemote("k");
    expect(fetcher).toHaveBeenCalledTimes(2);
  });

  it("shows a mutated value at once and asks again unless told not to", async () => {
    const fetcher = vi.fn(async () => "from server");
    registerFetcher("k", fetcher);
    await mutateRemote("k", null, { revalidate: false });
    expect(readRemoteSnapshot("k").data).toBeNull();
    expect(fetcher).not.toHaveBeenCalled();
    await mutateRemote("k");
    expect(readRemoteSnapshot("k").data).toBe("from server");
  });

  it("keeps the last good answer beside an error", async () => {
    let fail = false;
    registerFetcher("k", async () => {
      if (fail) throw new Error("offline");
      return "good";
    });
    await revalidateRemote("k");
    fail = true;
    await revalidateRemote("k");
    expect(readRemoteSnapshot("k")).toMatchObject({ data: "good", isLoading: false });
    expect(readRemoteSnapshot("k").error).toBeInstanceOf(Error);
  });

  it("does nothing for a key nobody reads yet", async () => {
    await revalidateRemote("nobody");
    expect(readRemoteSnapshot("nobody").isLoading).toBe(true);
  });
});
