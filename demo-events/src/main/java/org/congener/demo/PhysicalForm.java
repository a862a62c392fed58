package org.congener.demo;

/** How a compound is stocked; the unit of every quantity of that compound follows from it. */
enum PhysicalForm {
    LIQUID("l", "mL"),
    SOLID("s", "g"),
    SMALL_PACK("m", "mg"),
    GAS("g", "L");

    private final String code;
    private final String unit;

    PhysicalForm(String code, String unit) {
        this.code = code;
        this.unit = unit;
    }

    String unit() {
        return unit;
    }

    static PhysicalForm ofCode(String code) {
        for (PhysicalForm form : values()) {
            if (form.code.equals(code)) {
                return form;
            }
        }
        throw new IllegalArgumentException("unknown physical form '" + code + "' (expected l, s, m or g)");
    }
}
