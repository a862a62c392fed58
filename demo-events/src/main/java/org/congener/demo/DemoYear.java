package org.congener.demo;

import java.time.DayOfWeek;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;

/**
 * The simulated year (2026, UTC) and when people work in it: weekdays far more than weekends,
 * office hours peaking late morning, a summer lull in August and a quiet last fortnight of December.
 */
final class DemoYear {

    static final LocalDate FIRST_DAY = LocalDate.of(2026, 1, 1);
    static final int DAYS = 365;
    static final long START_EPOCH_SECOND = FIRST_DAY.atStartOfDay(ZoneOffset.UTC).toEpochSecond();
    static final long END_EPOCH_SECOND = START_EPOCH_SECOND + DAYS * 86_400L;

    /** Relative weight of each working hour 0..23. */
    private static final double[] HOUR_WEIGHTS = {
            0, 0, 0, 0, 0, 0, 0.1, 0.4, 1.2, 2.0, 2.4, 2.3, 1.4, 1.8, 2.1, 2.0, 1.6, 1.0, 0.5, 0.3, 0.2, 0.1, 0.05, 0};

    private static final double[] DAY_WEIGHTS = new double[DAYS];

    static {
        for (int d = 0; d < DAYS; d++) {
            DAY_WEIGHTS[d] = dayWeight(d);
        }
    }

    private DemoYear() {
    }

    static double dayWeight(int dayIndex) {
        LocalDate day = FIRST_DAY.plusDays(dayIndex);
        double weight = switch (day.getDayOfWeek()) {
            case SATURDAY -> 0.08;
            case SUNDAY -> 0.04;
            default -> 1.0;
        };
        if (day.getMonthValue() == 8) {
            weight *= 0.55;
        }
        if (day.getMonthValue() == 12 && day.getDayOfMonth() >= 20 || day.getDayOfYear() == 1) {
            weight *= 0.25;
        }
        return weight;
    }

    /** A working moment on a day in [fromDay, untilDay), as epoch seconds. */
    static long sampleMoment(DemoRandom random, int fromDay, int untilDay) {
        int day = fromDay + random.weightedIndex(DAY_WEIGHTS, fromDay, untilDay);
        return momentOn(random, day);
    }

    static long momentOn(DemoRandom random, int dayIndex) {
        int hour = random.weightedIndex(HOUR_WEIGHTS);
        return START_EPOCH_SECOND + dayIndex * 86_400L + hour * 3600L + random.below(3600);
    }

    static boolean isWeekend(long epochSecond) {
        DayOfWeek dow = Instant.ofEpochSecond(epochSecond).atZone(ZoneOffset.UTC).getDayOfWeek();
        return dow == DayOfWeek.SATURDAY || dow == DayOfWeek.SUNDAY;
    }

    static String iso(long epochSecond) {
        return Instant.ofEpochSecond(epochSecond).toString();
    }
}
