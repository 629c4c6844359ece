package dev.dwellwise.cure;

/**
 * The part of a {@link TemperaturePath} between two consecutive knots. It reads the path only
 * inside [start, end], at least one ulp away from either knot, so a path that jumps at a knot
 * gives each piece its own side of the jump; on a continuous path that ulp is below any accuracy
 * asked of it.
 */
record Piece(TemperaturePath path, double start, double end) {

    /** The pieces of a path, in time order; none for a path of no duration. */
    static Piece[] of(TemperaturePath path) {
        double[] knots = path.knots();
        Piece[] pieces = new Piece[Math.max(0, knots.length - 1)];
        for (int i = 0; i < pieces.length; i++) {
            pieces[i] = new Piece(path, knots[i], knots[i + 1]);
        }
        return pieces;
    }

    double kelvinAt(double t) {
        double inside = Math.max(Math.nextUp(start), Math.min(Math.nextDown(end), t));
        return path.kelvinAt(inside);
    }

    double length() {
        return end - start;
    }
}
