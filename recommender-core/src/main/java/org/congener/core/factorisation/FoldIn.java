package org.congener.core.factorisation;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * The ALS half-step for one row with the other side fixed — the trainer's user (and item) step and
 * the streaming fold-in of a researcher are this same code. Hu, Koren &amp; Volinsky 2008, eq. (4):
 * <pre>
 *   x_u = (YᵀY + Yᵀ(C_u − I)Y + λI)⁻¹ YᵀC_u p(u)
 * </pre>
 * where C_u is diagonal with c_ui (1 off the observed items) and p(u) is 1 on observed items, 0 elsewhere.
 * Only observed items enter the sums: YᵀC_uY = YᵀY + Σ_{i∈I_u} (c_ui − 1) y_i y_iᵀ and
 * YᵀC_u p(u) = Σ_{i∈I_u} c_ui y_i. With {@link Regularisation#PER_INTERACTION} λ becomes λ·n_u.
 *
 * <p>Two solvers: exact (build the system, Cholesky via EJML) and conjugate gradient from a warm
 * start without forming the system (Takács, Pilászy &amp; Tikk 2011, "Applications of the conjugate
 * gradient method for implicit feedback collaborative filtering", RecSys, Algorithm 2). The trainer
 * takes a fixed few CG steps per half-step; the stream runs CG to convergence
 * ({@link #foldInConverged}) from the researcher's previous vector when it has one: CG's error shrinks
 * from wherever it starts, so a start nearer the solution needs fewer steps (after one new interaction
 * only a step or two fewer, BENCHMARKS.md "Per-event scoring").
 *
 * <p>Instances are thread-safe; each thread passes its own {@link Workspace}.
 */
public final class FoldIn {
    /**
     * CG stops once ‖r‖ ≤ this · ‖YᵀC_u p(u)‖, r the residual of the fold-in system. The error then
     * satisfies ‖x − x*‖/‖x*‖ ≤ κ(A)·‖r‖/‖b‖; on fitted factors at k = 16–64 the relative error stayed
     * within about 12 times the tolerance, so 1e-11 keeps x within about 1e-10 of the exact solution
     * ({@code ConvergedFoldInTest} asserts 1e-9), for about two more steps than 1e-10 would take.
     */
    public static final double CONVERGED_RELATIVE_RESIDUAL = 1e-11;

    private final FixedFactors fixed;
    private final AlsConfig config;
    private final DenseKernels kernels;

    public FoldIn(FixedFactors fixed, AlsConfig config) {
        this(fixed, config, DenseKernels.best());
    }

    public FoldIn(FixedFactors fixed, AlsConfig config, DenseKernels kernels) {
        if (fixed.rank() != config.rank()) {
            throw new IllegalArgumentException("factors have rank " + fixed.rank() + ", config " + config.rank());
        }
        this.fixed = fixed;
        this.config = config;
        this.kernels = kernels;
    }

    public int rank() {
        return config.rank();
    }

    /** Exact fold-in of one researcher from the items and interaction strengths r_ui they touched. */
    public double[] foldInUser(int[] items, double[] strengths) {
        checkLengths(items, strengths);
        double[] x = new double[rank()];
        solveExact(items, strengths, 0, items.length, x, 0, newWorkspace());
        return x;
    }

    /**
     * Fold-in by {@code steps} CG steps warm-started from {@code start} (e.g. the researcher's old
     * factors; zeros for a new researcher). {@code start} is not modified.
     */
    public double[] foldInUser(int[] items, double[] strengths, double[] start, int steps) {
        checkLengths(items, strengths);
        if (start.length != rank()) {
            throw new IllegalArgumentException("start has " + start.length + " entries, rank is " + rank());
        }
        double[] x = start.clone();
        solveConjugateGradient(items, strengths, 0, items.length, x, 0, steps, newWorkspace());
        return x;
    }

    /**
     * Exact fold-in into the caller's array: {@code x[0..k)} receives x_u; nothing is allocated.
     * Modifies {@code x} and {@code ws}.
     */
    public void foldInExact(int[] items, double[] strengths, double[] x, Workspace ws) {
        checkLengths(items, strengths);
        checkVector("x", x);
        checkWorkspace(ws);
        solveExact(items, strengths, 0, items.length, x, 0, ws);
    }

    /** The cap on CG steps of {@link #foldInConverged}: in exact arithmetic k steps reach the solution. */
    public int convergedStepCap() {
        return 4 * rank();
    }

    /**
     * Conjugate gradient on the fold-in system until ‖r‖ ≤ {@link #CONVERGED_RELATIVE_RESIDUAL} ·
     * ‖YᵀC_u p(u)‖, from {@code start} (the researcher's previous vector under the same item factors),
     * or from zero when {@code start} is null. Writes x_u into {@code x[0..k)}; {@code start} may be
     * {@code x} itself and is otherwise not modified. Nothing is allocated. A researcher with no
     * interactions gets x = 0, the exact solution, after 0 steps.
     *
     * @return the CG steps taken
     * @throws NoConvergenceException when {@link #convergedStepCap()} steps leave the residual above
     *                                the tolerance
     * @throws NotPositiveDefiniteException when a search direction has d·Ad ≤ 0 (λ = 0 and too few data)
     */
    public int foldInConverged(int[] items, double[] strengths, double[] start, double[] x, Workspace ws) {
        checkLengths(items, strengths);
        checkVector("x", x);
        checkWorkspace(ws);
        if (start == null) {
            java.util.Arrays.fill(x, 0.0);
        } else {
            checkVector("start", start);
            if (start != x) {
                System.arraycopy(start, 0, x, 0, rank());
            }
        }
        int k = rank();
        int n = items.length;
        double[] rows = ws.gather(fixed.factors().data(), items, 0, n, k);
        double[] confidence = ws.coefficients;
        double[] weights = ws.weights;
        for (int p = 0; p < n; p++) {
            double c = config.confidenceOf(strengths[p]);
            confidence[p] = c;
            weights[p] = c - 1.0;
        }
        // b = YᵀC_u p(u) = Σ_{i∈I_u} c_ui y_i, and ‖b‖, the scale the residual is measured against
        double[] b = ws.target;
        java.util.Arrays.fill(b, 0.0);
        kernels.accumulateRows(rows, 0, n, k, confidence, 0, b, 0);
        double bb = kernels.dot(b, 0, b, 0, k);
        if (bb == 0.0) {
            // b = 0 and the system is positive definite: x = 0
            java.util.Arrays.fill(x, 0.0);
            return 0;
        }
        double stopBelow = CONVERGED_RELATIVE_RESIDUAL * CONVERGED_RELATIVE_RESIDUAL * bb;
        int cap = convergedStepCap();
        double lambda = config.regularisation().effectiveLambda(config.lambda(), n);
        int steps = convergedConjugateGradient(n, lambda, x, start == null, cap, stopBelow, ws);
        if (steps == cap && ws.lastResidualSquared > stopBelow) {
            throw new NoConvergenceException("fold-in CG left ‖r‖/‖b‖ = "
                    + Math.sqrt(ws.lastResidualSquared / bb) + " after " + cap + " steps");
        }
        return steps;
    }

    /**
     * CG on A x = b of eq. (4) from the start held in x (zero when {@code fromZero}), the gathered rows,
     * weights c_ui − 1 and b already in the workspace, until ‖r‖² ≤ {@code stopBelow} or {@code maxSteps}
     * steps; returns the steps taken and leaves ‖r‖² in the workspace. Takács, Pilászy &amp; Tikk 2011,
     * Algorithm 2: r = b − Ax, d = r; per step α = r·r / d·Ad, x += αd, r −= αAd, d = r_new + (r_new·r_new
     * / r·r) d. Each step is one {@link #systemProduct} and two length-k passes.
     */
    private int convergedConjugateGradient(int n, double lambda, double[] x, boolean fromZero, int maxSteps,
                                           double stopBelow, Workspace ws) {
        int k = rank();
        double[] b = ws.target;
        double[] r = ws.residual;
        double[] dir = ws.direction;
        double[] ad = ws.product;
        if (fromZero) {
            System.arraycopy(b, 0, r, 0, k);
        } else {
            systemProduct(x, n, lambda, ad, ws);
            for (int f = 0; f < k; f++) {
                r[f] = b[f] - ad[f];
            }
        }
        System.arraycopy(r, 0, dir, 0, k);
        double rr = kernels.dot(r, 0, r, 0, k);
        int s = 0;
        for (; s < maxSteps && rr > stopBelow; s++) {
            double curvature = systemProduct(dir, n, lambda, ad, ws);
            if (!(curvature > 0)) {
                throw new NotPositiveDefiniteException("fold-in system has d·Ad = " + curvature + " (λ = " + lambda + ")");
            }
            double rrNew = kernels.stepAlong(rr / curvature, dir, ad, x, 0, r, k);
            kernels.scaleAndAdd(rrNew / rr, r, dir, k);
            rr = rrNew;
        }
        ws.lastResidualSquared = rr;
        return s;
    }

    /**
     * out = A v = (YᵀY + λI) v + Σ_{i∈I_u} (c_ui − 1)(y_i·v) y_i over the gathered rows and weights, in
     * k² + 2·n_u·k multiply-adds without forming A; returns v·Av. YᵀY is symmetric, so its rows weighted
     * by the entries of v add up to YᵀY v with no dot products.
     */
    private double systemProduct(double[] v, int n, double lambda, double[] out, Workspace ws) {
        int k = rank();
        for (int f = 0; f < k; f++) {
            out[f] = lambda * v[f];
        }
        kernels.accumulateRows(fixed.gram(), 0, k, k, v, 0, out, 0);
        return kernels.accumulateProjections(ws.rows, 0, n, k, ws.weights, 0, v, 0, out, 0);
    }

    private void checkVector(String name, double[] v) {
        if (v.length != rank()) {
            throw new IllegalArgumentException(name + " has " + v.length + " entries, rank is " + rank());
        }
    }

    private void checkWorkspace(Workspace ws) {
        if (ws.rank() != rank()) {
            throw new IllegalArgumentException("workspace for rank " + ws.rank() + ", fold-in has rank " + rank());
        }
    }

    private static void checkLengths(int[] items, double[] strengths) {
        if (items.length != strengths.length) {
            throw new IllegalArgumentException(items.length + " items but " + strengths.length + " strengths");
        }
    }

    /** Scratch space of one thread. */
    public Workspace newWorkspace() {
        return new Workspace(rank());
    }

    /**
     * The configured solver on the row held in {@code cols/vals[from..to)}; writes the new row into
     * {@code x[xOff..xOff+k)}, which for CG also holds the warm start on entry.
     */
    void halfStep(int[] cols, double[] vals, int from, int to, double[] x, int xOff, Workspace ws) {
        if (config.solver() == SolverKind.CHOLESKY) {
            solveExact(cols, vals, from, to, x, xOff, ws);
        } else {
            solveConjugateGradient(cols, vals, from, to, x, xOff, config.cgSteps(), ws);
        }
    }

    void solveExact(int[] cols, double[] vals, int from, int to, double[] x, int xOff, Workspace ws) {
        int k = rank();
        double[] y = fixed.factors().data();
        double[] a = ws.system.data;
        double[] b = ws.rhs.data;
        System.arraycopy(fixed.gram(), 0, a, 0, k * k);
        java.util.Arrays.fill(b, 0.0);
        for (int p = from; p < to; p++) {
            int off = cols[p] * k;
            double c = config.confidenceOf(vals[p]);
            // Yᵀ(C_u − I)Y: rank-one update with weight c − 1, upper triangle only
            double w = c - 1.0;
            if (w != 0.0) {
                for (int f = 0; f < k; f++) {
                    kernels.axpy(w * y[off + f], y, off + f, a, f * k + f, k - f);
                }
            }
            // YᵀC_u p(u): p_ui = 1 on observed items
            kernels.axpy(c, y, off, b, 0, k);
        }
        double lambda = config.regularisation().effectiveLambda(config.lambda(), to - from);
        for (int f = 0; f < k; f++) {
            a[f * k + f] += lambda;
            for (int g = f + 1; g < k; g++) {
                a[g * k + f] = a[f * k + g];
            }
        }
        if (!ws.cholesky.setA(ws.system)) {
            throw new NotPositiveDefiniteException("half-step system is not positive definite (λ = " + lambda + ")");
        }
        ws.cholesky.solve(ws.rhs, ws.solution);
        System.arraycopy(ws.solution.data, 0, x, xOff, k);
    }

    void solveConjugateGradient(int[] cols, double[] vals, int from, int to, double[] x, int xOff, int steps,
                                Workspace ws) {
        conjugateGradient(cols, vals, from, to, x, xOff, steps, 1e-20, ws);
    }

    /**
     * The trainer's CG: at most {@code maxSteps} steps on the system A x = b of eq. (4) from the start
     * held in x, stopping once ‖r‖² ≤ {@code stopBelow}; returns the steps taken.
     * A·d = (YᵀY + λI)d + Σ_{i∈I_u} (c_ui − 1)(y_i·d) y_i, so each step costs k² + 2·n_u·k
     * multiply-adds and the system is never formed. Its sums are kept as they were, so trained factors
     * do not change; {@link #convergedConjugateGradient} is the stream's faster version.
     */
    private int conjugateGradient(int[] cols, double[] vals, int from, int to, double[] x, int xOff, int maxSteps,
                                  double stopBelow, Workspace ws) {
        int k = rank();
        int n = to - from;
        double lambda = config.regularisation().effectiveLambda(config.lambda(), n);
        double[] r = ws.residual;
        double[] dir = ws.direction;
        double[] ad = ws.product;
        // the researcher's rows y_i side by side, so each step's n_u dot products are one blocked
        // product and its n_u updates one pass over ad (the same sums in the same order as row by row)
        double[] rows = ws.gather(fixed.factors().data(), cols, from, to, k);
        double[] along = ws.along;
        double[] coef = ws.coefficients;
        // r = YᵀC_u p(u) − (YᵀC_uY + λI) x, with YᵀC_uY x = YᵀY x + Σ (c−1)(y·x) y
        multiplyGram(x, xOff, r, lambda);
        for (int f = 0; f < k; f++) {
            r[f] = -r[f];
        }
        kernels.multiply(rows, 0, n, k, x, xOff, along, 0);
        for (int p = 0; p < n; p++) {
            double c = config.confidenceOf(vals[from + p]);
            coef[p] = c - (c - 1.0) * along[p];
        }
        kernels.accumulateRows(rows, 0, n, k, coef, 0, r, 0);
        System.arraycopy(r, 0, dir, 0, k);
        double rr = kernels.dot(r, 0, r, 0, k);
        int s = 0;
        for (; s < maxSteps && rr > stopBelow; s++) {
            multiplyGram(dir, 0, ad, lambda);
            kernels.multiply(rows, 0, n, k, dir, 0, along, 0);
            for (int p = 0; p < n; p++) {
                coef[p] = (config.confidenceOf(vals[from + p]) - 1.0) * along[p];
            }
            kernels.accumulateRows(rows, 0, n, k, coef, 0, ad, 0);
            double curvature = kernels.dot(dir, 0, ad, 0, k);
            double step = rr / curvature;
            kernels.axpy(step, dir, 0, x, xOff, k);
            kernels.axpy(-step, ad, 0, r, 0, k);
            double rrNew = kernels.dot(r, 0, r, 0, k);
            double beta = rrNew / rr;
            for (int f = 0; f < k; f++) {
                dir[f] = r[f] + beta * dir[f];
            }
            rr = rrNew;
        }
        return s;
    }

    /** out = (YᵀY + λI) v, with v read from {@code v[vOff..vOff+k)}; each row of YᵀY·v as {@link DenseKernels#dot} sums it. */
    private void multiplyGram(double[] v, int vOff, double[] out, double lambda) {
        int k = rank();
        kernels.multiply(fixed.gram(), 0, k, k, v, vOff, out, 0);
        for (int f = 0; f < k; f++) {
            out[f] += lambda * v[vOff + f];
        }
    }

    /** Per-thread scratch arrays and the Cholesky solver, for any fold-in of rank k. */
    public static final class Workspace {
        final DMatrixRMaj system;
        final DMatrixRMaj rhs;
        final DMatrixRMaj solution;
        final LinearSolverDense<DMatrixRMaj> cholesky;
        final double[] residual;
        final double[] direction;
        final double[] product;
        /** b = YᵀC_u p(u) of the converged fold-in. */
        final double[] target;
        double lastResidualSquared;
        /** The rows y_i of the items being solved for, side by side; grown to the longest history seen. */
        double[] rows = new double[0];
        /** Per item: y_i·v for the current v, and the weight of y_i in an update (c_ui when forming b). */
        double[] along = new double[0];
        double[] coefficients = new double[0];
        /** Per item: c_ui − 1, the weight of y_i y_iᵀ in the system of the converged fold-in. */
        double[] weights = new double[0];

        public Workspace(int k) {
            system = new DMatrixRMaj(k, k);
            rhs = new DMatrixRMaj(k, 1);
            solution = new DMatrixRMaj(k, 1);
            cholesky = LinearSolverFactory_DDRM.chol(k);
            residual = new double[k];
            direction = new double[k];
            product = new double[k];
            target = new double[k];
        }

        public int rank() {
            return residual.length;
        }

        /** Copies the rows of {@code cols[from..to)} from {@code y} into {@link #rows} and returns it. */
        double[] gather(double[] y, int[] cols, int from, int to, int k) {
            int n = to - from;
            if (along.length < n) {
                int capacity = Math.max(n, 2 * along.length);
                rows = new double[capacity * k];
                along = new double[capacity];
                coefficients = new double[capacity];
                weights = new double[capacity];
            }
            for (int p = 0; p < n; p++) {
                System.arraycopy(y, cols[from + p] * k, rows, p * k, k);
            }
            return rows;
        }
    }
}
