package org.congener.core.factorisation;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.FloatVector;
import jdk.incubator.vector.VectorShape;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;

/** The same kernels on the incubating Vector API (fused multiply-add over the widest lanes). */
final class VectorKernels implements DenseKernels {
    public static final VectorKernels INSTANCE = new VectorKernels();
    private static final VectorSpecies<Double> SPECIES = DoubleVector.SPECIES_PREFERRED;
    /** Floats with as many lanes as {@link #SPECIES}, so a widened float block is one double vector. */
    private static final VectorSpecies<Float> FLOAT_SPECIES = VectorSpecies.of(float.class,
            VectorShape.forBitSize(SPECIES.vectorBitSize() / 2));

    private VectorKernels() {
    }

    @Override
    public double dot(double[] a, int aOff, double[] b, int bOff, int n) {
        DoubleVector acc = DoubleVector.zero(SPECIES);
        int lanes = SPECIES.length();
        int t = 0;
        for (; t + lanes <= n; t += lanes) {
            DoubleVector va = DoubleVector.fromArray(SPECIES, a, aOff + t);
            DoubleVector vb = DoubleVector.fromArray(SPECIES, b, bOff + t);
            acc = va.fma(vb, acc);
        }
        double s = acc.reduceLanes(VectorOperators.ADD);
        for (; t < n; t++) {
            s += a[aOff + t] * b[bOff + t];
        }
        return s;
    }

    @Override
    public void axpy(double alpha, double[] x, int xOff, double[] y, int yOff, int n) {
        int lanes = SPECIES.length();
        DoubleVector va = DoubleVector.broadcast(SPECIES, alpha);
        int t = 0;
        for (; t + lanes <= n; t += lanes) {
            DoubleVector vx = DoubleVector.fromArray(SPECIES, x, xOff + t);
            DoubleVector vy = DoubleVector.fromArray(SPECIES, y, yOff + t);
            vx.fma(va, vy).intoArray(y, yOff + t);
        }
        for (; t < n; t++) {
            y[yOff + t] += alpha * x[xOff + t];
        }
    }

    /**
     * Four lane blocks of {@code out} at a time, held in registers while every row adds its share, so
     * four independent chains of fused multiply-adds are in flight instead of one waiting on itself.
     * Each entry's operations and their order are still axpy's (a fused multiply-add per row, rows in
     * order, on the lanes; a plain multiply and add on the tail), so the result is the same bits. A row
     * of exactly eight lane blocks takes all eight at once.
     */
    @Override
    public void accumulateRows(double[] a, int aOff, int rows, int n, double[] s, int sOff, double[] out,
                               int outOff) {
        int lanes = SPECIES.length();
        if (n == 8 * lanes) {
            accumulateRowsEightBlocks(a, aOff, rows, s, sOff, out, outOff);
            return;
        }
        int t = 0;
        for (; t + 4 * lanes <= n; t += 4 * lanes) {
            DoubleVector acc0 = DoubleVector.fromArray(SPECIES, out, outOff + t);
            DoubleVector acc1 = DoubleVector.fromArray(SPECIES, out, outOff + t + lanes);
            DoubleVector acc2 = DoubleVector.fromArray(SPECIES, out, outOff + t + 2 * lanes);
            DoubleVector acc3 = DoubleVector.fromArray(SPECIES, out, outOff + t + 3 * lanes);
            for (int r = 0; r < rows; r++) {
                int row = aOff + r * n + t;
                DoubleVector weight = DoubleVector.broadcast(SPECIES, s[sOff + r]);
                acc0 = DoubleVector.fromArray(SPECIES, a, row).fma(weight, acc0);
                acc1 = DoubleVector.fromArray(SPECIES, a, row + lanes).fma(weight, acc1);
                acc2 = DoubleVector.fromArray(SPECIES, a, row + 2 * lanes).fma(weight, acc2);
                acc3 = DoubleVector.fromArray(SPECIES, a, row + 3 * lanes).fma(weight, acc3);
            }
            acc0.intoArray(out, outOff + t);
            acc1.intoArray(out, outOff + t + lanes);
            acc2.intoArray(out, outOff + t + 2 * lanes);
            acc3.intoArray(out, outOff + t + 3 * lanes);
        }
        for (; t + lanes <= n; t += lanes) {
            DoubleVector acc = DoubleVector.fromArray(SPECIES, out, outOff + t);
            for (int r = 0; r < rows; r++) {
                DoubleVector row = DoubleVector.fromArray(SPECIES, a, aOff + r * n + t);
                acc = row.fma(DoubleVector.broadcast(SPECIES, s[sOff + r]), acc);
            }
            acc.intoArray(out, outOff + t);
        }
        for (; t < n; t++) {
            double sum = out[outOff + t];
            for (int r = 0; r < rows; r++) {
                sum += s[sOff + r] * a[aOff + r * n + t];
            }
            out[outOff + t] = sum;
        }
    }

    /**
     * A row of eight lane blocks (k = 64 at eight lanes) in one pass: eight accumulator chains keep both
     * multiply-add pipes busy where four would wait on their own latency, and each row is read once.
     * Each entry still sees axpy's fused multiply-adds in row order, so the bits are the same.
     */
    private static void accumulateRowsEightBlocks(double[] a, int aOff, int rows, double[] s, int sOff, double[] out,
                                                  int outOff) {
        int lanes = SPECIES.length();
        int n = 8 * lanes;
        DoubleVector acc0 = DoubleVector.fromArray(SPECIES, out, outOff);
        DoubleVector acc1 = DoubleVector.fromArray(SPECIES, out, outOff + lanes);
        DoubleVector acc2 = DoubleVector.fromArray(SPECIES, out, outOff + 2 * lanes);
        DoubleVector acc3 = DoubleVector.fromArray(SPECIES, out, outOff + 3 * lanes);
        DoubleVector acc4 = DoubleVector.fromArray(SPECIES, out, outOff + 4 * lanes);
        DoubleVector acc5 = DoubleVector.fromArray(SPECIES, out, outOff + 5 * lanes);
        DoubleVector acc6 = DoubleVector.fromArray(SPECIES, out, outOff + 6 * lanes);
        DoubleVector acc7 = DoubleVector.fromArray(SPECIES, out, outOff + 7 * lanes);
        for (int r = 0; r < rows; r++) {
            int row = aOff + r * n;
            DoubleVector weight = DoubleVector.broadcast(SPECIES, s[sOff + r]);
            acc0 = DoubleVector.fromArray(SPECIES, a, row).fma(weight, acc0);
            acc1 = DoubleVector.fromArray(SPECIES, a, row + lanes).fma(weight, acc1);
            acc2 = DoubleVector.fromArray(SPECIES, a, row + 2 * lanes).fma(weight, acc2);
            acc3 = DoubleVector.fromArray(SPECIES, a, row + 3 * lanes).fma(weight, acc3);
            acc4 = DoubleVector.fromArray(SPECIES, a, row + 4 * lanes).fma(weight, acc4);
            acc5 = DoubleVector.fromArray(SPECIES, a, row + 5 * lanes).fma(weight, acc5);
            acc6 = DoubleVector.fromArray(SPECIES, a, row + 6 * lanes).fma(weight, acc6);
            acc7 = DoubleVector.fromArray(SPECIES, a, row + 7 * lanes).fma(weight, acc7);
        }
        acc0.intoArray(out, outOff);
        acc1.intoArray(out, outOff + lanes);
        acc2.intoArray(out, outOff + 2 * lanes);
        acc3.intoArray(out, outOff + 3 * lanes);
        acc4.intoArray(out, outOff + 4 * lanes);
        acc5.intoArray(out, outOff + 5 * lanes);
        acc6.intoArray(out, outOff + 6 * lanes);
        acc7.intoArray(out, outOff + 7 * lanes);
    }

    /**
     * When a row is eight or four lane blocks long (k = 64 or 32 at eight lanes), d and the
     * accumulated out stay in registers for the whole block and each row is loaded once: its dot with
     * d, then its update from the same registers. The Vector API cannot keep an array of vectors in
     * registers, hence one method per length with named vectors. Other lengths take each row's dot and
     * axpy in turn, the row still in cache for the second.
     */
    @Override
    public double accumulateProjections(double[] a, int aOff, int rows, int n, double[] w, int wOff, double[] d,
                                        int dOff, double[] out, int outOff) {
        int lanes = SPECIES.length();
        if (n == 8 * lanes) {
            return projectionsEightBlocks(a, aOff, rows, w, wOff, d, dOff, out, outOff);
        }
        if (n == 4 * lanes) {
            return projectionsFourBlocks(a, aOff, rows, w, wOff, d, dOff, out, outOff);
        }
        return DenseKernels.super.accumulateProjections(a, aOff, rows, n, w, wOff, d, dOff, out, outOff);
    }

    private static double projectionsEightBlocks(double[] a, int aOff, int rows, double[] w, int wOff, double[] d,
                                                 int dOff, double[] out, int outOff) {
        int lanes = SPECIES.length();
        int n = 8 * lanes;
        DoubleVector d0 = DoubleVector.fromArray(SPECIES, d, dOff);
        DoubleVector d1 = DoubleVector.fromArray(SPECIES, d, dOff + lanes);
        DoubleVector d2 = DoubleVector.fromArray(SPECIES, d, dOff + 2 * lanes);
        DoubleVector d3 = DoubleVector.fromArray(SPECIES, d, dOff + 3 * lanes);
        DoubleVector d4 = DoubleVector.fromArray(SPECIES, d, dOff + 4 * lanes);
        DoubleVector d5 = DoubleVector.fromArray(SPECIES, d, dOff + 5 * lanes);
        DoubleVector d6 = DoubleVector.fromArray(SPECIES, d, dOff + 6 * lanes);
        DoubleVector d7 = DoubleVector.fromArray(SPECIES, d, dOff + 7 * lanes);
        DoubleVector o0 = DoubleVector.fromArray(SPECIES, out, outOff);
        DoubleVector o1 = DoubleVector.fromArray(SPECIES, out, outOff + lanes);
        DoubleVector o2 = DoubleVector.fromArray(SPECIES, out, outOff + 2 * lanes);
        DoubleVector o3 = DoubleVector.fromArray(SPECIES, out, outOff + 3 * lanes);
        DoubleVector o4 = DoubleVector.fromArray(SPECIES, out, outOff + 4 * lanes);
        DoubleVector o5 = DoubleVector.fromArray(SPECIES, out, outOff + 5 * lanes);
        DoubleVector o6 = DoubleVector.fromArray(SPECIES, out, outOff + 6 * lanes);
        DoubleVector o7 = DoubleVector.fromArray(SPECIES, out, outOff + 7 * lanes);
        for (int r = 0; r < rows; r++) {
            int row = aOff + r * n;
            DoubleVector y0 = DoubleVector.fromArray(SPECIES, a, row);
            DoubleVector y1 = DoubleVector.fromArray(SPECIES, a, row + lanes);
            DoubleVector y2 = DoubleVector.fromArray(SPECIES, a, row + 2 * lanes);
            DoubleVector y3 = DoubleVector.fromArray(SPECIES, a, row + 3 * lanes);
            DoubleVector y4 = DoubleVector.fromArray(SPECIES, a, row + 4 * lanes);
            DoubleVector y5 = DoubleVector.fromArray(SPECIES, a, row + 5 * lanes);
            DoubleVector y6 = DoubleVector.fromArray(SPECIES, a, row + 6 * lanes);
            DoubleVector y7 = DoubleVector.fromArray(SPECIES, a, row + 7 * lanes);
            // two chains of four, so the dot's latency is half that of one chain of eight
            DoubleVector even = y0.mul(d0);
            DoubleVector odd = y1.mul(d1);
            even = y2.fma(d2, even);
            odd = y3.fma(d3, odd);
            even = y4.fma(d4, even);
            odd = y5.fma(d5, odd);
            even = y6.fma(d6, even);
            odd = y7.fma(d7, odd);
            double along = even.add(odd).reduceLanes(VectorOperators.ADD);
            DoubleVector weight = DoubleVector.broadcast(SPECIES, w[wOff + r] * along);
            o0 = y0.fma(weight, o0);
            o1 = y1.fma(weight, o1);
            o2 = y2.fma(weight, o2);
            o3 = y3.fma(weight, o3);
            o4 = y4.fma(weight, o4);
            o5 = y5.fma(weight, o5);
            o6 = y6.fma(weight, o6);
            o7 = y7.fma(weight, o7);
        }
        o0.intoArray(out, outOff);
        o1.intoArray(out, outOff + lanes);
        o2.intoArray(out, outOff + 2 * lanes);
        o3.intoArray(out, outOff + 3 * lanes);
        o4.intoArray(out, outOff + 4 * lanes);
        o5.intoArray(out, outOff + 5 * lanes);
        o6.intoArray(out, outOff + 6 * lanes);
        o7.intoArray(out, outOff + 7 * lanes);
        DoubleVector even = o0.mul(d0);
        DoubleVector odd = o1.mul(d1);
        even = o2.fma(d2, even);
        odd = o3.fma(d3, odd);
        even = o4.fma(d4, even);
        odd = o5.fma(d5, odd);
        even = o6.fma(d6, even);
        odd = o7.fma(d7, odd);
        return even.add(odd).reduceLanes(VectorOperators.ADD);
    }

    private static double projectionsFourBlocks(double[] a, int aOff, int rows, double[] w, int wOff, double[] d,
                                                int dOff, double[] out, int outOff) {
        int lanes = SPECIES.length();
        int n = 4 * lanes;
        DoubleVector d0 = DoubleVector.fromArray(SPECIES, d, dOff);
        DoubleVector d1 = DoubleVector.fromArray(SPECIES, d, dOff + lanes);
        DoubleVector d2 = DoubleVector.fromArray(SPECIES, d, dOff + 2 * lanes);
        DoubleVector d3 = DoubleVector.fromArray(SPECIES, d, dOff + 3 * lanes);
        DoubleVector o0 = DoubleVector.fromArray(SPECIES, out, outOff);
        DoubleVector o1 = DoubleVector.fromArray(SPECIES, out, outOff + lanes);
        DoubleVector o2 = DoubleVector.fromArray(SPECIES, out, outOff + 2 * lanes);
        DoubleVector o3 = DoubleVector.fromArray(SPECIES, out, outOff + 3 * lanes);
        for (int r = 0; r < rows; r++) {
            int row = aOff + r * n;
            DoubleVector y0 = DoubleVector.fromArray(SPECIES, a, row);
            DoubleVector y1 = DoubleVector.fromArray(SPECIES, a, row + lanes);
            DoubleVector y2 = DoubleVector.fromArray(SPECIES, a, row + 2 * lanes);
            DoubleVector y3 = DoubleVector.fromArray(SPECIES, a, row + 3 * lanes);
            DoubleVector even = y2.fma(d2, y0.mul(d0));
            DoubleVector odd = y3.fma(d3, y1.mul(d1));
            double along = even.add(odd).reduceLanes(VectorOperators.ADD);
            DoubleVector weight = DoubleVector.broadcast(SPECIES, w[wOff + r] * along);
            o0 = y0.fma(weight, o0);
            o1 = y1.fma(weight, o1);
            o2 = y2.fma(weight, o2);
            o3 = y3.fma(weight, o3);
        }
        o0.intoArray(out, outOff);
        o1.intoArray(out, outOff + lanes);
        o2.intoArray(out, outOff + 2 * lanes);
        o3.intoArray(out, outOff + 3 * lanes);
        DoubleVector even = o2.fma(d2, o0.mul(d0));
        DoubleVector odd = o3.fma(d3, o1.mul(d1));
        return even.add(odd).reduceLanes(VectorOperators.ADD);
    }

    /** The two updates and the new residual's squared length in one pass over the lanes. */
    @Override
    public double stepAlong(double alpha, double[] d, double[] ad, double[] x, int xOff, double[] r, int n) {
        int lanes = SPECIES.length();
        DoubleVector forward = DoubleVector.broadcast(SPECIES, alpha);
        DoubleVector back = DoubleVector.broadcast(SPECIES, -alpha);
        DoubleVector squares = DoubleVector.zero(SPECIES);
        int t = 0;
        for (; t + lanes <= n; t += lanes) {
            DoubleVector vx = DoubleVector.fromArray(SPECIES, x, xOff + t);
            DoubleVector.fromArray(SPECIES, d, t).fma(forward, vx).intoArray(x, xOff + t);
            DoubleVector vr = DoubleVector.fromArray(SPECIES, ad, t).fma(back, DoubleVector.fromArray(SPECIES, r, t));
            vr.intoArray(r, t);
            squares = vr.fma(vr, squares);
        }
        double rr = squares.reduceLanes(VectorOperators.ADD);
        for (; t < n; t++) {
            x[xOff + t] += alpha * d[t];
            r[t] -= alpha * ad[t];
            rr += r[t] * r[t];
        }
        return rr;
    }

    @Override
    public void scaleAndAdd(double beta, double[] x, double[] y, int n) {
        int lanes = SPECIES.length();
        DoubleVector scale = DoubleVector.broadcast(SPECIES, beta);
        int t = 0;
        for (; t + lanes <= n; t += lanes) {
            DoubleVector.fromArray(SPECIES, y, t).fma(scale, DoubleVector.fromArray(SPECIES, x, t)).intoArray(y, t);
        }
        for (; t < n; t++) {
            y[t] = x[t] + beta * y[t];
        }
    }

    /**
     * Four rows per pass: x is loaded once per lane block for the four, and the four accumulator chains
     * are independent, so the fused multiply-adds of one row do not wait on each other's latency.
     */
    @Override
    public void multiply(double[] a, int aOff, int rows, int n, double[] x, int xOff, double[] out, int outOff) {
        int lanes = SPECIES.length();
        int body = n - n % lanes;
        int r = 0;
        for (; r + 4 <= rows; r += 4) {
            int o0 = aOff + r * n;
            int o1 = o0 + n;
            int o2 = o1 + n;
            int o3 = o2 + n;
            DoubleVector acc0 = DoubleVector.zero(SPECIES);
            DoubleVector acc1 = acc0;
            DoubleVector acc2 = acc0;
            DoubleVector acc3 = acc0;
            for (int t = 0; t < body; t += lanes) {
                DoubleVector vx = DoubleVector.fromArray(SPECIES, x, xOff + t);
                acc0 = DoubleVector.fromArray(SPECIES, a, o0 + t).fma(vx, acc0);
                acc1 = DoubleVector.fromArray(SPECIES, a, o1 + t).fma(vx, acc1);
                acc2 = DoubleVector.fromArray(SPECIES, a, o2 + t).fma(vx, acc2);
                acc3 = DoubleVector.fromArray(SPECIES, a, o3 + t).fma(vx, acc3);
            }
            double s0 = acc0.reduceLanes(VectorOperators.ADD);
            double s1 = acc1.reduceLanes(VectorOperators.ADD);
            double s2 = acc2.reduceLanes(VectorOperators.ADD);
            double s3 = acc3.reduceLanes(VectorOperators.ADD);
            // the tail in dot's order: after the lane sum, one product at a time
            for (int t = body; t < n; t++) {
                double xt = x[xOff + t];
                s0 += a[o0 + t] * xt;
                s1 += a[o1 + t] * xt;
                s2 += a[o2 + t] * xt;
                s3 += a[o3 + t] * xt;
            }
            out[outOff + r] = s0;
            out[outOff + r + 1] = s1;
            out[outOff + r + 2] = s2;
            out[outOff + r + 3] = s3;
        }
        for (; r < rows; r++) {
            out[outOff + r] = dot(a, aOff + r * n, x, xOff, n);
        }
    }

    /**
     * The factor-major product: each lane is one item's chain, so a row's sum never leaves its lane
     * and needs no horizontal sum. Four lane blocks of items at a time keep four independent chains in
     * flight (the multiply-add latency is four cycles); the items after the last group of four, one
     * block at a time, the last block stored under a mask; items past the last whole block of the
     * stride (a stride not padded to whole vectors) one at a time with {@link Math#fma}.
     */
    @Override
    public void multiplyFactorMajor(float[] a, int aOff, int rows, int stride, int n, double[] x, int xOff,
                                    double[] out, int outOff) {
        int group = 4 * SPECIES.length();
        int i = 0;
        for (; i + group <= rows; i += group) {
            fourBlocks(a, aOff + i, stride, n, x, xOff, out, outOff + i);
        }
        lastItems(a, aOff, i, rows, stride, n, x, xOff, out, outOff);
    }

    /**
     * Items in groups of four lane blocks, and for each group the vectors four at a time: each widened
     * block of factors serves four vectors (sixteen accumulator chains, with the four blocks and a
     * broadcast 21 of AVX-512's 32 vector registers), and the group's factors (4 blocks × k, 8 KB as
     * floats at k = 64) stay in the first-level cache while every vector passes over them. The vectors
     * left over and the items after the last group go one vector at a time, as in the one-vector
     * product.
     */
    @Override
    public void multiplyFactorMajorMany(float[] a, int aOff, int rows, int stride, int n, double[][] xs, int count,
                                        double[][] outs, int outOff) {
        int group = 4 * SPECIES.length();
        int i = 0;
        for (; i + group <= rows; i += group) {
            int c = 0;
            for (; c + 4 <= count; c += 4) {
                fourBlocksFourVectors(a, aOff + i, stride, n, xs[c], xs[c + 1], xs[c + 2], xs[c + 3],
                        outs[c], outs[c + 1], outs[c + 2], outs[c + 3], outOff + i);
            }
            for (; c < count; c++) {
                fourBlocks(a, aOff + i, stride, n, xs[c], 0, outs[c], outOff + i);
            }
        }
        for (int c = 0; c < count; c++) {
            lastItems(a, aOff, i, rows, stride, n, xs[c], 0, outs[c], outOff);
        }
    }

    /** Four lane blocks of items from {@code at} (in factor 0's block) times one vector, into out[to..). */
    private static void fourBlocks(float[] a, int at, int stride, int n, double[] x, int xOff, double[] out, int to) {
        int lanes = SPECIES.length();
        DoubleVector s0 = DoubleVector.zero(SPECIES);
        DoubleVector s1 = s0;
        DoubleVector s2 = s0;
        DoubleVector s3 = s0;
        for (int t = 0, p = at; t < n; t++, p += stride) {
            DoubleVector xt = DoubleVector.broadcast(SPECIES, x[xOff + t]);
            s0 = widened(a, p).fma(xt, s0);
            s1 = widened(a, p + lanes).fma(xt, s1);
            s2 = widened(a, p + 2 * lanes).fma(xt, s2);
            s3 = widened(a, p + 3 * lanes).fma(xt, s3);
        }
        store(s0, s1, s2, s3, out, to);
    }

    /** {@link #fourBlocks} for four vectors w, x, y, z at once, each widened block serving all four. */
    private static void fourBlocksFourVectors(float[] a, int at, int stride, int n, double[] w, double[] x,
                                              double[] y, double[] z, double[] outW, double[] outX, double[] outY,
                                              double[] outZ, int to) {
        int lanes = SPECIES.length();
        DoubleVector w0 = DoubleVector.zero(SPECIES);
        DoubleVector w1 = w0;
        DoubleVector w2 = w0;
        DoubleVector w3 = w0;
        DoubleVector x0 = w0;
        DoubleVector x1 = w0;
        DoubleVector x2 = w0;
        DoubleVector x3 = w0;
        DoubleVector y0 = w0;
        DoubleVector y1 = w0;
        DoubleVector y2 = w0;
        DoubleVector y3 = w0;
        DoubleVector z0 = w0;
        DoubleVector z1 = w0;
        DoubleVector z2 = w0;
        DoubleVector z3 = w0;
        for (int t = 0, p = at; t < n; t++, p += stride) {
            DoubleVector f0 = widened(a, p);
            DoubleVector f1 = widened(a, p + lanes);
            DoubleVector f2 = widened(a, p + 2 * lanes);
            DoubleVector f3 = widened(a, p + 3 * lanes);
            DoubleVector b = DoubleVector.broadcast(SPECIES, w[t]);
            w0 = f0.fma(b, w0);
            w1 = f1.fma(b, w1);
            w2 = f2.fma(b, w2);
            w3 = f3.fma(b, w3);
            b = DoubleVector.broadcast(SPECIES, x[t]);
            x0 = f0.fma(b, x0);
            x1 = f1.fma(b, x1);
            x2 = f2.fma(b, x2);
            x3 = f3.fma(b, x3);
            b = DoubleVector.broadcast(SPECIES, y[t]);
            y0 = f0.fma(b, y0);
            y1 = f1.fma(b, y1);
            y2 = f2.fma(b, y2);
            y3 = f3.fma(b, y3);
            b = DoubleVector.broadcast(SPECIES, z[t]);
            z0 = f0.fma(b, z0);
            z1 = f1.fma(b, z1);
            z2 = f2.fma(b, z2);
            z3 = f3.fma(b, z3);
        }
        store(w0, w1, w2, w3, outW, to);
        store(x0, x1, x2, x3, outX, to);
        store(y0, y1, y2, y3, outY, to);
        store(z0, z1, z2, z3, outZ, to);
    }

    private static void store(DoubleVector s0, DoubleVector s1, DoubleVector s2, DoubleVector s3, double[] out,
                              int to) {
        int lanes = SPECIES.length();
        s0.intoArray(out, to);
        s1.intoArray(out, to + lanes);
        s2.intoArray(out, to + 2 * lanes);
        s3.intoArray(out, to + 3 * lanes);
    }

    /**
     * Items from..rows: one lane block at a time while the block lies inside the stride (the lanes past
     * {@code rows} read padding and are not stored), then one item at a time in the same order.
     */
    private static void lastItems(float[] a, int aOff, int from, int rows, int stride, int n, double[] x, int xOff,
                                  double[] out, int outOff) {
        int lanes = SPECIES.length();
        int i = from;
        for (; i < rows && i + lanes <= stride; i += lanes) {
            DoubleVector s = DoubleVector.zero(SPECIES);
            for (int t = 0, p = aOff + i; t < n; t++, p += stride) {
                s = widened(a, p).fma(DoubleVector.broadcast(SPECIES, x[xOff + t]), s);
            }
            s.intoArray(out, outOff + i, SPECIES.indexInRange(i, rows));
        }
        for (; i < rows; i++) {
            double s = 0.0;
            for (int t = 0, p = aOff + i; t < n; t++, p += stride) {
                s = Math.fma((double) a[p], x[xOff + t], s);
            }
            out[outOff + i] = s;
        }
    }

    @Override
    public void minMax(double[] v, int from, int to, double[] into) {
        int lanes = SPECIES.length();
        DoubleVector lo = DoubleVector.broadcast(SPECIES, Double.POSITIVE_INFINITY);
        DoubleVector hi = DoubleVector.broadcast(SPECIES, Double.NEGATIVE_INFINITY);
        int t = from;
        for (; t + lanes <= to; t += lanes) {
            DoubleVector block = DoubleVector.fromArray(SPECIES, v, t);
            lo = lo.lanewise(VectorOperators.MIN, block);
            hi = hi.lanewise(VectorOperators.MAX, block);
        }
        // lane by lane rather than by a MIN / MAX reduction, which this JDK may not compile to vector code
        double least = Double.POSITIVE_INFINITY;
        double greatest = Double.NEGATIVE_INFINITY;
        for (int lane = 0; lane < lanes; lane++) {
            least = Math.min(least, lo.lane(lane));
            greatest = Math.max(greatest, hi.lane(lane));
        }
        for (; t < to; t++) {
            least = Math.min(least, v[t]);
            greatest = Math.max(greatest, v[t]);
        }
        into[0] = least;
        into[1] = greatest;
    }

    /** Eight entries per comparison; only a block holding an entry above the threshold is looked into. */
    @Override
    public int firstAbove(double[] v, int from, int to, double threshold) {
        int lanes = SPECIES.length();
        DoubleVector bar = DoubleVector.broadcast(SPECIES, threshold);
        int t = from;
        for (; t + lanes <= to; t += lanes) {
            VectorMask<Double> above = DoubleVector.fromArray(SPECIES, v, t).compare(VectorOperators.GT, bar);
            if (above.anyTrue()) {
                return t + above.firstTrue();
            }
        }
        for (; t < to; t++) {
            if (v[t] > threshold) {
                return t;
            }
        }
        return to;
    }

    private static DoubleVector widened(float[] a, int offset) {
        return (DoubleVector) FloatVector.fromArray(FLOAT_SPECIES, a, offset)
                .convertShape(VectorOperators.F2D, SPECIES, 0);
    }

    @Override
    public String toString() {
        return "vector(" + SPECIES.length() + " lanes)";
    }
}
