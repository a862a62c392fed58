package org.congener.core.interactions;

import java.util.SplittableRandom;

/**
 * Synthetic interactions with planted low-rank structure, for tests and benchmarks (never for the
 * demo): true factors u_f, v_f ~ N(0, 1); each user draws about interactions/users items with
 * probability ∝ exp(u·v / √trueRank · sharpness), strengths 1 + Poisson-like counts of repeats.
 * Users draw from their own random stream, so the data depend only on the arguments.
 */
public final class PlantedInteractions {
    private PlantedInteractions() {
    }

    public static InteractionMatrix generate(int users, int items, int interactions, int trueRank,
                                             double sharpness, long seed) {
        double[] userTrue = normals(users * trueRank, new SplittableRandom(seed));
        double[] itemTrue = normals(items * trueRank, new SplittableRandom(seed ^ 0x5DEECE66DL));
        double scale = sharpness / Math.sqrt(trueRank);
        InteractionMatrixBuilder builder = new InteractionMatrixBuilder(users, items);
        double[] cumulative = new double[items];
        long drawn = 0;
        for (int u = 0; u < users; u++) {
            SplittableRandom random = new SplittableRandom(seed * 31 + u);
            double total = 0;
            for (int i = 0; i < items; i++) {
                double s = 0;
                for (int f = 0; f < trueRank; f++) {
                    s += userTrue[u * trueRank + f] * itemTrue[i * trueRank + f];
                }
                total += Math.exp(s * scale);
                cumulative[i] = total;
            }
            // spread the remaining draws evenly over the remaining users
            long target = (long) interactions * (u + 1) / users;
            int count = (int) (target - drawn);
            drawn = target;
            for (int n = 0; n < count; n++) {
                double pick = random.nextDouble() * total;
                int lo = 0;
                int hi = items - 1;
                while (lo < hi) {
                    int mid = (lo + hi) >>> 1;
                    if (cumulative[mid] < pick) {
                        lo = mid + 1;
                    } else {
                        hi = mid;
                    }
                }
                builder.add(u, lo, 1.0);
            }
        }
        return builder.build();
    }

    private static double[] normals(int n, SplittableRandom random) {
        double[] out = new double[n];
        for (int t = 0; t < n; t++) {
            double u1 = 1.0 - random.nextDouble();
            double u2 = random.nextDouble();
            out[t] = Math.sqrt(-2.0 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
        }
        return out;
    }
}
