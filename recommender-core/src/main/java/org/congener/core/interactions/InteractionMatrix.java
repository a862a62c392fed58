package org.congener.core.interactions;

/**
 * The researcher × compound matrix of interaction strengths r_ui, kept in CSR in both orientations:
 * {@link #byUser()} has one row per researcher, {@link #byItem()} one row per compound.
 */
public final class InteractionMatrix {
    private final SparseRows byUser;
    private final SparseRows byItem;

    public InteractionMatrix(SparseRows byUser) {
        this.byUser = byUser;
        this.byItem = byUser.transpose();
    }

    public SparseRows byUser() {
        return byUser;
    }

    public SparseRows byItem() {
        return byItem;
    }

    public int userCount() {
        return byUser.rowCount();
    }

    public int itemCount() {
        return byUser.columnCount();
    }

    public int nonZeroCount() {
        return byUser.nonZeroCount();
    }

    /** Builds a matrix from parallel arrays of (user, item, strength); repeated cells are summed. */
    public static InteractionMatrix of(int userCount, int itemCount, int[] users, int[] items, double[] strengths) {
        InteractionMatrixBuilder builder = new InteractionMatrixBuilder(userCount, itemCount);
        for (int n = 0; n < users.length; n++) {
            builder.add(users[n], items[n], strengths[n]);
        }
        return builder.build();
    }
}
