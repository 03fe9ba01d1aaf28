package org.protolyte.report.plot;

/** Clipping to the plot area, in fractions of the axes: the unit square [0, 1] × [0, 1]. */
final class Clip {

    /** Beyond this a fraction is as good as infinite, and differences of two could overflow. */
    private static final double FAR = 1e300;

    private Clip() {
    }

    static boolean usable(double f) {
        return Math.abs(f) <= FAR;
    }

    static boolean inside(double[] uv) {
        return uv != null && uv[0] >= 0 && uv[0] <= 1 && uv[1] >= 0 && uv[1] <= 1;
    }

    /**
     * The part of the segment (u0, v0)–(u1, v1) inside the square (Liang–Barsky), as {u0, v0, u1, v1, t0, t1}
     * where t0 and t1 are where it enters and leaves along the segment (0 and 1 when it does not cross an edge);
     * null if no part is inside.
     */
    static double[] segment(double u0, double v0, double u1, double v1) {
        double du = u1 - u0;
        double dv = v1 - v0;
        double[] p = {-du, du, -dv, dv};
        double[] q = {u0, 1 - u0, v0, 1 - v0};
        double t0 = 0;
        double t1 = 1;
        for (int i = 0; i < 4; i++) {
            if (p[i] == 0) {
                if (q[i] < 0) {
                    return null;            // parallel to this edge and outside it
                }
                continue;
            }
            double r = q[i] / p[i];
            if (p[i] < 0) {
                t0 = Math.max(t0, r);
            } else {
                t1 = Math.min(t1, r);
            }
        }
        if (t0 > t1) {
            return null;
        }
        return new double[] {u0 + t0 * du, v0 + t0 * dv, u0 + t1 * du, v0 + t1 * dv, t0, t1};
    }
}
