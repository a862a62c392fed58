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
     * The float-block product with the widening in registers: each lane block of a row is loaded as
     * floats and converted to one double vector, then multiplied exactly as in the double product
     * (same lanes, same order, same tail), so the result is the double product of the widened block
     * bit for bit without a pass through a scratch array.
     */
    @Override
    public void multiply(float[] a, int aOff, int rows, int n, double[] x, int xOff, double[] out, int outOff,
                         double[] scratch) {
        int r = 0;
        for (; r + 4 <= rows; r += 4) {
            fourRows(a, aOff + r * n, n, x, xOff, out, outOff + r);
        }
        if (r < rows) {
            // the last rows through the scratch path, which ends in dot's order like the double product
            DenseKernels.super.multiply(a, aOff + r * n, rows - r, n, x, xOff, out, outOff + r, scratch);
        }
    }

    /**
     * Several vectors against one float block, widened in registers: four rows at a time, each row
     * block loaded and widened once for two vectors. Every (row, vector) pair is summed exactly as
     * {@link #multiply(float[], int, int, int, double[], int, double[], int, double[])} sums it, so each
     * out_c is that product bit for bit.
     */
    @Override
    public void multiplyMany(float[] a, int aOff, int rows, int n, double[][] xs, int count, double[][] outs,
                             int outOff, double[] scratch) {
        int r = 0;
        for (; r + 4 <= rows; r += 4) {
            int rowsAt = aOff + r * n;
            int c = 0;
            for (; c + 4 <= count; c += 4) {
                fourRowsFourVectors(a, rowsAt, n, xs, c, outs, outOff + r);
            }
            for (; c + 2 <= count; c += 2) {
                fourRowsTwoVectors(a, rowsAt, n, xs[c], xs[c + 1], outs[c], outs[c + 1], outOff + r);
            }
            if (c < count) {
                fourRows(a, rowsAt, n, xs[c], 0, outs[c], outOff + r);
            }
        }
        if (r < rows) {
            for (int c = 0; c < count; c++) {
                DenseKernels.super.multiply(a, aOff + r * n, rows - r, n, xs[c], 0, outs[c], outOff + r, scratch);
            }
        }
    }

    /** out[at..at+4) = the four float rows from {@code o0} times x: the body of the float product. */
    private static void fourRows(float[] a, int o0, int n, double[] x, int xOff, double[] out, int at) {
        int lanes = SPECIES.length();
        int body = n - n % lanes;
        int o1 = o0 + n;
        int o2 = o1 + n;
        int o3 = o2 + n;
        DoubleVector acc0 = DoubleVector.zero(SPECIES);
        DoubleVector acc1 = acc0;
        DoubleVector acc2 = acc0;
        DoubleVector acc3 = acc0;
        for (int t = 0; t < body; t += lanes) {
            DoubleVector vx = DoubleVector.fromArray(SPECIES, x, xOff + t);
            acc0 = widened(a, o0 + t).fma(vx, acc0);
            acc1 = widened(a, o1 + t).fma(vx, acc1);
            acc2 = widened(a, o2 + t).fma(vx, acc2);
            acc3 = widened(a, o3 + t).fma(vx, acc3);
        }
        finish(a, o0, n, body, x, xOff, acc0, acc1, acc2, acc3, out, at);
    }

    /**
     * {@link #fourRows} for vectors c..c+3 at once: each widened row block serves four vectors, sixteen
     * independent accumulator chains.
     */
    private static void fourRowsFourVectors(float[] a, int o0, int n, double[][] xs, int c, double[][] outs, int at) {
        int lanes = SPECIES.length();
        int body = n - n % lanes;
        int o1 = o0 + n;
        int o2 = o1 + n;
        int o3 = o2 + n;
        double[] xa = xs[c];
        double[] xb = xs[c + 1];
        double[] xc = xs[c + 2];
        double[] xd = xs[c + 3];
        DoubleVector a0 = DoubleVector.zero(SPECIES);
        DoubleVector a1 = a0;
        DoubleVector a2 = a0;
        DoubleVector a3 = a0;
        DoubleVector b0 = a0;
        DoubleVector b1 = a0;
        DoubleVector b2 = a0;
        DoubleVector b3 = a0;
        DoubleVector c0 = a0;
        DoubleVector c1 = a0;
        DoubleVector c2 = a0;
        DoubleVector c3 = a0;
        DoubleVector d0 = a0;
        DoubleVector d1 = a0;
        DoubleVector d2 = a0;
        DoubleVector d3 = a0;
        for (int t = 0; t < body; t += lanes) {
            DoubleVector w0 = widened(a, o0 + t);
            DoubleVector w1 = widened(a, o1 + t);
            DoubleVector w2 = widened(a, o2 + t);
            DoubleVector w3 = widened(a, o3 + t);
            DoubleVector va = DoubleVector.fromArray(SPECIES, xa, t);
            a0 = w0.fma(va, a0);
            a1 = w1.fma(va, a1);
            a2 = w2.fma(va, a2);
            a3 = w3.fma(va, a3);
            DoubleVector vb = DoubleVector.fromArray(SPECIES, xb, t);
            b0 = w0.fma(vb, b0);
            b1 = w1.fma(vb, b1);
            b2 = w2.fma(vb, b2);
            b3 = w3.fma(vb, b3);
            DoubleVector vc = DoubleVector.fromArray(SPECIES, xc, t);
            c0 = w0.fma(vc, c0);
            c1 = w1.fma(vc, c1);
            c2 = w2.fma(vc, c2);
            c3 = w3.fma(vc, c3);
            DoubleVector vd = DoubleVector.fromArray(SPECIES, xd, t);
            d0 = w0.fma(vd, d0);
            d1 = w1.fma(vd, d1);
            d2 = w2.fma(vd, d2);
            d3 = w3.fma(vd, d3);
        }
        finish(a, o0, n, body, xa, 0, a0, a1, a2, a3, outs[c], at);
        finish(a, o0, n, body, xb, 0, b0, b1, b2, b3, outs[c + 1], at);
        finish(a, o0, n, body, xc, 0, c0, c1, c2, c3, outs[c + 2], at);
        finish(a, o0, n, body, xd, 0, d0, d1, d2, d3, outs[c + 3], at);
    }

    /** The four rows' lane sums, then their tails in dot's order, into out[at..at+4). */
    private static void finish(float[] a, int o0, int n, int body, double[] x, int xOff, DoubleVector acc0,
                               DoubleVector acc1, DoubleVector acc2, DoubleVector acc3, double[] out, int at) {
        double s0 = acc0.reduceLanes(VectorOperators.ADD);
        double s1 = acc1.reduceLanes(VectorOperators.ADD);
        double s2 = acc2.reduceLanes(VectorOperators.ADD);
        double s3 = acc3.reduceLanes(VectorOperators.ADD);
        for (int t = body; t < n; t++) {
            double xt = x[xOff + t];
            s0 += (double) a[o0 + t] * xt;
            s1 += (double) a[o0 + n + t] * xt;
            s2 += (double) a[o0 + 2 * n + t] * xt;
            s3 += (double) a[o0 + 3 * n + t] * xt;
        }
        out[at] = s0;
        out[at + 1] = s1;
        out[at + 2] = s2;
        out[at + 3] = s3;
    }

    /** {@link #fourRows} for two vectors at once, sharing each widened row block. */
    private static void fourRowsTwoVectors(float[] a, int o0, int n, double[] x, double[] z, double[] outX,
                                           double[] outZ, int at) {
        int lanes = SPECIES.length();
        int body = n - n % lanes;
        int o1 = o0 + n;
        int o2 = o1 + n;
        int o3 = o2 + n;
        DoubleVector x0 = DoubleVector.zero(SPECIES);
        DoubleVector x1 = x0;
        DoubleVector x2 = x0;
        DoubleVector x3 = x0;
        DoubleVector z0 = x0;
        DoubleVector z1 = x0;
        DoubleVector z2 = x0;
        DoubleVector z3 = x0;
        for (int t = 0; t < body; t += lanes) {
            DoubleVector vx = DoubleVector.fromArray(SPECIES, x, t);
            DoubleVector vz = DoubleVector.fromArray(SPECIES, z, t);
            DoubleVector w0 = widened(a, o0 + t);
            DoubleVector w1 = widened(a, o1 + t);
            DoubleVector w2 = widened(a, o2 + t);
            DoubleVector w3 = widened(a, o3 + t);
            x0 = w0.fma(vx, x0);
            x1 = w1.fma(vx, x1);
            x2 = w2.fma(vx, x2);
            x3 = w3.fma(vx, x3);
            z0 = w0.fma(vz, z0);
            z1 = w1.fma(vz, z1);
            z2 = w2.fma(vz, z2);
            z3 = w3.fma(vz, z3);
        }
        finish(a, o0, n, body, x, 0, x0, x1, x2, x3, outX, at);
        finish(a, o0, n, body, z, 0, z0, z1, z2, z3, outZ, at);
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
