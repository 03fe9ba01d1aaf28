package org.protolyte.chemistry;

/** The equilibrium could not be solved (no bracketed root, no convergence); the caveat says why. */
public final class IndeterminateException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient Caveat caveat;

    public IndeterminateException(Caveat caveat) {
        super(caveat.message());
        this.caveat = caveat;
    }

    public Caveat caveat() {
        return caveat;
    }
}
