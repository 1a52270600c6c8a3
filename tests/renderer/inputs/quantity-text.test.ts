/**
 * What a field shows and stores. Conversion factors are exact by definition: 1 ft = 0.3048 m and
 * 1 in = 0.0254 m (international yard and pound, 1959; NIST SP 811 appendix B), 1 US gallon =
 * 3.785411784 L (NIST SP 811), so 1 MGD = 3785.411784 m³ / 86 400 s = 0.043812636 m³/s.
 */
import { describe, expect, it } from "vitest";
import {
  displayText,
  displayUnit,
  enteredNote,
  fieldView,
  formatQuantity,
  storedValueFromText,
  storedValueInField,
} from "../../../renderer/inputs/quantity-text";

describe("displayText()", () => {
  it("shows SI numbers as they are in SI", () => {
    expect(displayText(14, "length", "si"), "14 m").toBe("14");
  });
  it("converts to US customary units for display", () => {
    expect(displayText(0.3048, "length", "us"), "0.3048 m is 1 ft (NIST SP 811)").toBe("1");
    expect(displayText(0.043812636, "flow", "us"), "1 MGD in m³/s").toBe("1");
    expect(displayText(20, "temperature", "us"), "20 °C is 68 °F").toBe("68");
  });
  it("converts a stored value with its own unit", () => {
    expect(displayText("8 in", "smallLength", "si"), "8 in = 0.2032 m").toBe("0.2032");
    expect(
      displayText("0.5 knot", "speed", "si"),
      "0.5 kn = 926 m / 3600 s = 0.2572 m/s (1 kn = 1852 m/h, exact)",
    ).toBe("0.2572");
  });
  it("shows unreadable stored text as it is, so the user sees what is wrong", () => {
    expect(displayText("12 parsecs per fortnight", "speed", "si"), "kept verbatim").toBe("12 parsecs per fortnight");
  });
  it("shows nothing for an absent value", () => {
    expect(displayText(undefined, "length", "si"), "empty").toBe("");
  });
});

describe("storedValueFromText()", () => {
  it("stores a plain number typed in SI as a number", () => {
    expect(storedValueFromText("45", "angle", "si"), "angle").toBe(45);
  });
  it("stores a plain number typed in US units with its unit, so the file stays exact", () => {
    expect(storedValueFromText("12", "flow", "us"), "12 MGD").toBe("12 MGD");
    expect(storedValueFromText("8", "smallLength", "us"), "8 in").toBe("8 in");
  });
  it("keeps text with a unit verbatim for core to parse", () => {
    expect(storedValueFromText(" 8 in ", "smallLength", "si"), "trimmed").toBe("8 in");
  });
  it("keeps text that is not a number verbatim, so core reports it at the field's path", () => {
    expect(storedValueFromText("abc", "angle", "si"), "bad input stored as typed").toBe("abc");
  });
  it("removes the value for empty text", () => {
    expect(storedValueFromText("  ", "length", "si"), "empty").toBeUndefined();
  });
  it("leaves units off dimensionless ratios in either system", () => {
    expect(storedValueFromText("0.45", "ratio", "us"), "recovery").toBe(0.45);
  });
});

describe("enteredNote()", () => {
  it("mentions the entered text when its unit differs from the one shown", () => {
    expect(enteredNote("8 in", "smallLength", "si"), "inches shown in metres").toBe("8 in");
  });
  it("says nothing when the field already shows the same number", () => {
    expect(enteredNote("14 m", "length", "si"), "metres shown in metres").toBeNull();
    expect(enteredNote(14, "length", "si"), "a plain number").toBeNull();
  });
});

describe("formatQuantity()", () => {
  it("formats results with their display unit", () => {
    expect(formatQuantity(3.048, "length", "us"), "10 ft").toEqual({ text: "10", unit: "ft" });
    expect(formatQuantity(null, "length", "si"), "missing values show a dash").toEqual({ text: "—", unit: "m" });
  });
  it("names the unit of each kind", () => {
    expect(displayUnit("flow", "si"), "SI flow").toBe("m³/s");
    expect(displayUnit("temperature", "us"), "US temperature").toBe("°F");
  });
});

describe("fieldView(): values stay in the unit they were entered in, with SI beside", () => {
  it("shows a plant flow typed in m³/d in m³/d, with m³/s beside (1 d = 86 400 s)", () => {
    const v = fieldView("5000 m^3/day", "flow", "si");
    expect(v.text, "the number as entered").toBe("5000");
    expect(v.unit, "the unit as entered, with a superscript").toBe("m³/day");
    expect(v.beside, "5000/86400 m³/s beside").toBe("= 0.05787 m³/s");
  });
  it("keeps MLD, L/s and percent", () => {
    expect(fieldView("40 MLD", "flow", "si"), "40 MLD = 40 000 m³ / 86 400 s").toMatchObject({
      text: "40",
      unit: "MLD",
      beside: "= 0.463 m³/s",
    });
    expect(fieldView("300 L/s", "flow", "si"), "300 L/s").toMatchObject({
      text: "300",
      unit: "L/s",
      beside: "= 0.3 m³/s",
    });
    expect(fieldView("45 %", "ratio", "si"), "45 % recovery").toMatchObject({
      text: "45",
      unit: "%",
      beside: "= 0.45",
    });
  });
  it("lets values in the SI unit or the chosen system's unit follow the unit system", () => {
    expect(fieldView("18 m", "length", "us"), "18 m shown in feet with US units, SI beside").toMatchObject({
      unit: "ft",
      beside: "= 18 m",
    });
    expect(fieldView("12 MGD", "flow", "us"), "MGD is the US flow unit; 12 MGD = 0.5258 m³/s").toMatchObject({
      text: "12",
      unit: "MGD",
      beside: "= 0.5258 m³/s",
    });
    expect(fieldView(0.5, "flow", "si"), "a plain number").toMatchObject({ text: "0.5", unit: "m³/s", beside: null });
  });
  it("shows the US unit beside as well when US units are chosen", () => {
    expect(fieldView("40 MLD", "flow", "us").beside, "SI and MGD (40 MLD = 10.567 MGD)").toBe(
      "= 0.463 m³/s = 10.57 MGD",
    );
  });
});

describe("storedValueInField()", () => {
  it("takes a plain number in the unit the field shows", () => {
    expect(storedValueInField("6000", "flow", "si", "m^3/day"), "stays in m³/day").toBe("6000 m^3/day");
    expect(storedValueInField("42", "ratio", "si", "%"), "stays in percent").toBe("42 %");
  });
  it("keeps a typed unit and plain SI numbers as before", () => {
    expect(storedValueInField("0.4 m3/s", "flow", "si", "m^3/day"), "a new unit").toBe("0.4 m3/s");
    expect(storedValueInField("0.4", "flow", "si", null), "plain SI").toBe(0.4);
  });
});
