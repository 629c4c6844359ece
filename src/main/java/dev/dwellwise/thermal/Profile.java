package dev.dwellwise.thermal;

/** Temperatures through the thickness at one time: positions in metres from the front face, kelvin. */
public record Profile(double timeSeconds, double[] positionsM, double[] temperaturesK) {

    public Profile {
        positionsM = positionsM.clone();
        temperaturesK = temperaturesK.clone();
    }

    @Override
    public double[] positionsM() {
        return positionsM.clone();
    }

    @Override
    public double[] temperaturesK() {
        return temperaturesK.clone();
    }
}
