package dev.dwellwise.thermal;

/** The job asks for a back end that this build does not have. */
public final class ModelUnavailableException extends RuntimeException {

    public ModelUnavailableException(String model) {
        super("the " + model + " model is not available in this version");
    }
}
