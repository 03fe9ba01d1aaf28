package org.protolyte.chemistry;

/**
 * A x = y by Gaussian elimination with partial pivoting. The systems are a handful of coupled mass balances, where a
 * library call's allocations would cost more than the algebra.
 */
final class LinearSolve {

    private LinearSolve() {
    }

    /** Solves the leading {@code size} rows and columns, overwriting both; returns y as x. */
    static double[] inPlace(double[][] a, double[] y, int size) {
        for (int col = 0; col < size; col++) {
            int pivot = col;
            for (int r = col + 1; r < size; r++) {
                if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) {
                    pivot = r;
                }
            }
            if (!(Math.abs(a[pivot][col]) > 0)) {
                throw new IndeterminateException(Caveat.indeterminate("complexation-singular",
                        "the mass balances of the complexes are singular"));
            }
            double[] row = a[pivot];
            a[pivot] = a[col];
            a[col] = row;
            double t = y[pivot];
            y[pivot] = y[col];
            y[col] = t;
            for (int r = col + 1; r < size; r++) {
                double f = a[r][col] / a[col][col];
                if (f != 0) {
                    for (int k = col; k < size; k++) {
                        a[r][k] -= f * a[col][k];
                    }
                    y[r] -= f * y[col];
                }
            }
        }
        for (int r = size - 1; r >= 0; r--) {
            double v = y[r];
            for (int k = r + 1; k < size; k++) {
                v -= a[r][k] * y[k];
            }
            y[r] = v / a[r][r];
        }
        return y;
    }
}
