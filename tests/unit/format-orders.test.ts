// format.ts lists origins, findings and pipe work in the order of its labels, so the editor need not
// load the scheme model (and zod) for them; the orders must stay the model's.
import { describe, expect, it } from "vitest";
import { findingOrder, originOrder, pipeWorkOrder } from "@/components/spec/format";
import { findings, origins, pipeWorks } from "@/lib/estimate/scheme";

describe("the editor's label orders", () => {
  it("are the scheme model's", () => {
    expect(originOrder).toEqual([...origins]);
    expect(findingOrder).toEqual([...findings]);
    expect(pipeWorkOrder).toEqual([...pipeWorks]);
  });
});
