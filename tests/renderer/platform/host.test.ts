/** The host facade's file reading in a browser: dropped files are read only when they could be a scenario. */
import { describe, expect, it } from "vitest";
import { MAX_SCENARIO_BYTES } from "../../../electron/file-store";
import { MAX_DROPPED_FILE_BYTES, readDroppedFile } from "../../../renderer/platform/host";

describe("readDroppedFile()", () => {
  it("reads a small file's text under its name", async () => {
    const opened = await readDroppedFile(new File(['{"format":"brinefield-scenario"}'], "site.json"));
    expect(opened, "name and text").toEqual({ path: "site.json", text: '{"format":"brinefield-scenario"}' });
  });
  it("refuses, unread, a file larger than the 5 MB a scenario may be (the desktop host's cap)", async () => {
    expect(MAX_DROPPED_FILE_BYTES, "the same cap as the desktop host's").toBe(MAX_SCENARIO_BYTES);
    const big = new File([new Uint8Array(MAX_DROPPED_FILE_BYTES + 1)], "survey.mp4");
    await expect(readDroppedFile(big), "too large").rejects.toThrow(/larger than the 5 MB Brinefield reads/);
  });
  it("drops a UTF-8 byte-order mark and refuses UTF-16 with a request to save as UTF-8", async () => {
    const bom = await readDroppedFile(new File([new Uint8Array([0xef, 0xbb, 0xbf, 0x7b, 0x7d])], "bom.json"));
    expect(bom.text, "BOM removed").toBe("{}");
    const utf16 = new File([new Uint8Array([0xff, 0xfe, 0x7b, 0x00, 0x7d, 0x00])], "utf16.json");
    await expect(readDroppedFile(utf16), "UTF-16 refused").rejects.toThrow(/UTF-16.*save it as UTF-8/);
  });
});
