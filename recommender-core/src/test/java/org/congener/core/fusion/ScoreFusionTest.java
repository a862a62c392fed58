package org.congener.core.fusion;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.congener.schemas.FusionRule;
import org.junit.jupiter.api.Test;

/**
 * {@link ScoreFusion} against the fusion as it was ({@link ScoringAsBefore#fuse}), on scores that take
 * each of its branches: non-finite candidates, sides whose candidates all tie, and the plain case.
 */
class ScoreFusionTest {
    private static final int ITEMS = 97;

    @Test
    void shouldEqualTheFusionAsItWasBitForBitWhenScoresAreNonFiniteTiedOrPlain() {
        SplittableRandom random = new SplittableRandom(41);
        ScoreFusion fusion = new ScoreFusion(ITEMS);
        double[] out = new double[ITEMS];
        for (int round = 0; round < 96; round++) {
            int[] training = random.ints(random.nextInt(6), 0, ITEMS).sorted().distinct().toArray();
            double[] cf = side(random, round % 4);
            double[] semantic = side(random, (round / 4) % 4);
            for (FusionSettings settings : new FusionSettings[] {FusionSettings.product(), FusionSettings.blend(0.7),
                    FusionSettings.rankFusion(60), new FusionSettings(FusionRule.CF_ONLY, 1, 60, 0),
                    new FusionSettings(FusionRule.SEMANTIC_ONLY, 0, 60, 0)}) {
                double[] expected = ScoringAsBefore.fuse(settings, cf.clone(), semantic.clone(), training);
                double[] cfBefore = cf.clone();
                fusion.fuse(settings, cf, semantic, training, 0, training.length, out);
                for (int i = 0; i < ITEMS; i++) {
                    assertEquals(Double.doubleToLongBits(expected[i]), Double.doubleToLongBits(out[i]),
                            settings.rule() + ", round " + round + ", item " + i);
                    assertEquals(Double.doubleToLongBits(cfBefore[i]), Double.doubleToLongBits(cf[i]), "cf unchanged");
                }
            }
        }
    }

    /**
     * 0: plain Gaussian scores; 1: a few infinities and NaNs among them; 2: all equal; 3: zeros of both
     * signs and a few small values (where min and max must tell −0.0 from 0.0).
     */
    private static double[] side(SplittableRandom random, int kind) {
        double[] v = new double[ITEMS];
        for (int i = 0; i < ITEMS; i++) {
            v[i] = switch (kind) {
                case 2 -> 0.25;
                case 3 -> random.nextInt(8) == 0 ? random.nextDouble() - 0.5 : random.nextBoolean() ? 0.0 : -0.0;
                default -> random.nextGaussian();
            };
        }
        if (kind == 1) {
            v[random.nextInt(ITEMS)] = Double.NaN;
            v[random.nextInt(ITEMS)] = Double.POSITIVE_INFINITY;
            v[random.nextInt(ITEMS)] = Double.NEGATIVE_INFINITY;
        }
        return v;
    }
}
