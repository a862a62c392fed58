package org.congener.demo;

import org.congener.schemas.UsageKind;

/**
 * Realistic amounts per kind of event and physical form, in thousandths of the form's unit
 * (integers keep stock arithmetic exact). Orders come in usual pack sizes; a withdrawal takes a
 * container or a part of one from the stores; usage-log entries are log-normal around a typical
 * bench amount; a view has no quantity.
 * The sizes are common laboratory practice, chosen for the demo.
 */
final class QuantityModel {

    private static final double[] LIQUID_ORDER = {100, 250, 500, 1000, 2500};
    private static final double[] LIQUID_ORDER_W = {2, 3, 3, 2, 1};
    private static final double[] LIQUID_WITHDRAWAL = {25, 50, 100, 250, 500, 1000};
    private static final double[] LIQUID_WITHDRAWAL_W = {1, 2, 3, 3, 2, 1};
    private static final double[] SOLID_ORDER = {1, 5, 10, 25, 100, 250, 500};
    private static final double[] SOLID_ORDER_W = {1, 3, 2, 3, 2, 1, 0.5};
    private static final double[] SOLID_WITHDRAWAL = {1, 5, 10, 25, 50, 100};
    private static final double[] SOLID_WITHDRAWAL_W = {2, 3, 3, 2, 1, 1};
    private static final double[] SMALL_ORDER = {50, 100, 250, 500, 1000};
    private static final double[] SMALL_ORDER_W = {2, 3, 3, 2, 1};
    private static final double[] SMALL_WITHDRAWAL = {25, 50, 100, 250, 500};
    private static final double[] SMALL_WITHDRAWAL_W = {2, 3, 3, 2, 1};
    private static final double[] GAS_ORDER = {10, 50};
    private static final double[] GAS_ORDER_W = {2, 1};

    private QuantityModel() {
    }

    /** Pack size of a fresh order, in thousandths of the unit. */
    static long orderPack(PhysicalForm form, DemoRandom random) {
        return switch (form) {
            case LIQUID -> milli(LIQUID_ORDER[random.weightedIndex(LIQUID_ORDER_W)]);
            case SOLID -> milli(SOLID_ORDER[random.weightedIndex(SOLID_ORDER_W)]);
            case SMALL_PACK -> milli(SMALL_ORDER[random.weightedIndex(SMALL_ORDER_W)]);
            case GAS -> milli(GAS_ORDER[random.weightedIndex(GAS_ORDER_W)]);
        };
    }

    /** The amount of one event, in thousandths of the unit; 0 for a view. */
    static long amount(UsageKind kind, PhysicalForm form, DemoRandom random) {
        return switch (kind) {
            case VIEW -> 0;
            case ORDER -> orderPack(form, random);
            case WITHDRAWAL -> switch (form) {
                case LIQUID -> milli(LIQUID_WITHDRAWAL[random.weightedIndex(LIQUID_WITHDRAWAL_W)]);
                case SOLID -> milli(SOLID_WITHDRAWAL[random.weightedIndex(SOLID_WITHDRAWAL_W)]);
                case SMALL_PACK -> milli(SMALL_WITHDRAWAL[random.weightedIndex(SMALL_WITHDRAWAL_W)]);
                case GAS -> throw new IllegalArgumentException("gases are not withdrawn from the stores");
            };
            case USAGE_LOG -> switch (form) {
                case LIQUID -> bench(random, 5.0, 1.0, 0.1, 500, 100);
                case SOLID -> bench(random, 0.5, 1.1, 0.001, 100, 1);
                case SMALL_PACK -> bench(random, 10.0, 0.9, 0.1, 1000, 100);
                case GAS -> bench(random, 5.0, 0.8, 0.1, 50, 100);
            };
        };
    }

    /** Log-normal bench amount with the given median, clamped, rounded to {@code stepMilli}. */
    private static long bench(DemoRandom random, double median, double sigma, double min, double max, long stepMilli) {
        double value = Math.min(max, Math.max(min, median * random.logNormal(sigma)));
        long milli = Math.round(value * 1000.0 / stepMilli) * stepMilli;
        return Math.max(milli, Math.round(min * 1000.0));
    }

    private static long milli(double value) {
        return Math.round(value * 1000.0);
    }
}
