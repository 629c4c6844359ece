package dev.dwellwise.cure;

/** A cure calculation could not be completed within its {@link CureBudget} or did not converge. */
public final class CureComputationException extends RuntimeException {

    public CureComputationException(String message) {
        super(message);
    }
}
