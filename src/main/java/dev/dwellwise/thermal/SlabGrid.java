package dev.dwellwise.thermal;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The finite-volume cells through a wall, front face (x = 0) first. A wall exposed on both faces
 * whose layers read the same from either face has a symmetric history (both faces see the same
 * stage): only its front half is computed, with the mid-plane as a face without flux
 * ({@link BackFace#MID_PLANE}), which gives the accuracy of twice the cells at the cost of the cells.
 *
 * <p>Cell faces follow one smooth stretching of a uniform coordinate s in [0, 1] over the computed
 * span D,
 * <pre>  back face exposed: x(s) = D [s − β sin(2πs) / (2π)]      otherwise: x(s) = D [s − β sin(πs) / π]</pre>
 * finest at the exposed faces, where the steep early gradients and the face values extrapolated
 * from the half cell are. Layer interfaces and, with both faces of an asymmetric wall exposed, the
 * mid-plane are always cell faces: each cell is one material and the mid-plane value is read at a
 * face. A smooth stretching keeps the scheme second order.
 */
final class SlabGrid {

    /** What lies at the back of the computed span. */
    enum BackFace {
        /** The wall's back face, exposed like the front. */
        EXPOSED,
        /** The wall's back face, insulated. */
        INSULATED,
        /** The mid-plane of a symmetric wall exposed on both faces: no flux crosses it. */
        MID_PLANE
    }

    /**
     * β: the largest cell is (1 + β)/(1 − β) ≈ 1.9 times the smallest. Mild on purpose: over a whole
     * history the coarse cells matter as much as the early surface gradients; against the exact
     * series (Bi 0.3 to 30, Fo ≥ 0.005) β = 0.3 gave the smallest worst error of surface, core and
     * mean (about half that of β = 0.5, and better than uniform cells at high Bi).
     */
    static final double GRADING = 0.3;

    /** Break points closer than this fraction of the thickness are the same plane. */
    private static final double SAME_PLANE = 1e-12;

    private final double[] faces;
    private final Material[] materials;
    private final BackFace back;
    private final int midPlaneFace;

    private SlabGrid(double[] faces, Material[] materials, BackFace back, int midPlaneFace) {
        this.faces = faces;
        this.materials = materials;
        this.back = back;
        this.midPlaneFace = midPlaneFace;
    }

    /**
     * The grid for the part with {@code cellsPerLength} cells per conduction length (the thickness
     * over the exposed faces): the computed span holds that many, twice that for an asymmetric wall
     * exposed on both faces, so that accuracy does not depend on the faces. A layer (or half-wall)
     * that its share would leave empty still gets one cell.
     */
    static SlabGrid of(ThermalPart part, int cellsPerLength) {
        BackFace back = switch (part.exposedFaces()) {
            case 1 -> BackFace.INSULATED;
            case 2 -> isSymmetric(part.layers()) ? BackFace.MID_PLANE : BackFace.EXPOSED;
            default -> throw new IllegalArgumentException("exposedFaces must be 1 or 2");
        };
        double span = back == BackFace.MID_PLANE ? part.thicknessM() / 2 : part.thicknessM();
        List<Piece> pieces = pieces(part.layers(), span, back == BackFace.EXPOSED);
        double[] sAt = new double[pieces.size() + 1];
        for (int j = 1; j < pieces.size(); j++) {
            sAt[j] = inverseStretch(pieces.get(j).startM / span, back);
        }
        sAt[pieces.size()] = 1;
        int[] counts = allocate(sAt, back == BackFace.EXPOSED ? 2 * cellsPerLength : cellsPerLength);
        int total = 0;
        for (int n : counts) {
            total += n;
        }
        double[] faces = new double[total + 1];
        Material[] materials = new Material[total];
        int midPlaneFace = -1;
        int cell = 0;
        for (int j = 0; j < pieces.size(); j++) {
            Piece piece = pieces.get(j);
            if (back == BackFace.EXPOSED && Math.abs(piece.startM - span / 2) <= SAME_PLANE * span) {
                midPlaneFace = cell;
            }
            faces[cell] = piece.startM;
            for (int m = 0; m < counts[j]; m++) {
                if (m > 0) {
                    faces[cell] = span * stretch(sAt[j] + (sAt[j + 1] - sAt[j]) * m / counts[j], back);
                }
                materials[cell] = piece.material;
                cell++;
            }
        }
        faces[total] = span;
        return new SlabGrid(faces, materials, back, midPlaneFace);
    }

    /** The same layers, in the same thicknesses, read from either face. */
    private static boolean isSymmetric(List<Layer> layers) {
        for (int i = 0, j = layers.size() - 1; i < j; i++, j--) {
            Layer a = layers.get(i);
            Layer b = layers.get(j);
            if (!Objects.equals(a.material(), b.material())
                    || Math.abs(a.thicknessM() - b.thicknessM()) > SAME_PLANE * a.thicknessM()) {
                return false;
            }
        }
        return true;
    }

    /** The span [0, span] cut at its layer interfaces and, if asked, at its middle. */
    private static List<Piece> pieces(List<Layer> layers, double span, boolean cutAtMiddle) {
        double mid = cutAtMiddle ? span / 2 : Double.NaN;
        double same = SAME_PLANE * span;
        List<Piece> pieces = new ArrayList<>();
        double start = 0;
        for (Layer layer : layers) {
            if (!(layer.thicknessM() > 0)) {
                throw new IllegalArgumentException("every layer needs a positive thickness");
            }
            if (start >= span - same) {
                break;
            }
            double end = start + layer.thicknessM();
            pieces.add(new Piece(start, layer.material()));
            if (mid > start + same && mid < end - same) {
                pieces.add(new Piece(mid, layer.material()));
            }
            start = end;
        }
        return pieces;
    }

    /**
     * Cells per piece in proportion to its share of s, at least one each; the rounding remainder
     * goes to the largest fractional shares, ties to the front.
     */
    private static int[] allocate(double[] sAt, int cells) {
        int n = sAt.length - 1;
        int[] counts = new int[n];
        double[] share = new double[n];
        int sum = 0;
        for (int j = 0; j < n; j++) {
            share[j] = cells * (sAt[j + 1] - sAt[j]);
            counts[j] = Math.max(1, (int) Math.floor(share[j]));
            sum += counts[j];
        }
        while (sum < cells) {
            int best = 0;
            for (int j = 1; j < n; j++) {
                if (share[j] - counts[j] > share[best] - counts[best]) {
                    best = j;
                }
            }
            counts[best]++;
            sum++;
        }
        while (sum > cells) {
            int largest = 0;
            for (int j = 1; j < n; j++) {
                if (counts[j] > counts[largest]) {
                    largest = j;
                }
            }
            if (counts[largest] == 1) {
                break;
            }
            counts[largest]--;
            sum--;
        }
        return counts;
    }

    /** x/D as a function of s. */
    static double stretch(double s, BackFace back) {
        double period = back == BackFace.EXPOSED ? 2 * Math.PI : Math.PI;
        return s - GRADING * Math.sin(period * s) / period;
    }

    private static double inverseStretch(double fraction, BackFace back) {
        return new BrentSolver(1e-15, 1e-15).solve(200, s -> stretch(s, back) - fraction, 0, 1);
    }

    int cells() {
        return materials.length;
    }

    BackFace back() {
        return back;
    }

    /** Thickness of the computed span, metres: the wall, or its front half for {@link BackFace#MID_PLANE}. */
    double spanM() {
        return faces[faces.length - 1];
    }

    double widthM(int cell) {
        return faces[cell + 1] - faces[cell];
    }

    double centreM(int cell) {
        return 0.5 * (faces[cell] + faces[cell + 1]);
    }

    Material material(int cell) {
        return materials[cell];
    }

    /** Index of the cell face at the mid-plane of an asymmetric wall exposed on both faces (between cells i − 1 and i), else −1. */
    int midPlaneFace() {
        return midPlaneFace;
    }

    /** Cell face positions, metres from the front face: cells() + 1 of them. */
    double[] facesM() {
        return faces.clone();
    }

    /**
     * Where a profile is read, metres from the front face: front face, cell centres, back of the
     * span; for {@link BackFace#MID_PLANE} then mirrored on to the back face of the wall.
     */
    double[] profilePositionsM() {
        int n = cells();
        double span = spanM();
        boolean mirrored = back == BackFace.MID_PLANE;
        double[] positions = new double[mirrored ? 2 * n + 3 : n + 2];
        for (int i = 0; i < n; i++) {
            positions[i + 1] = centreM(i);
        }
        positions[n + 1] = span;
        if (mirrored) {
            for (int i = 0; i <= n + 1; i++) {
                positions[2 * n + 2 - i] = 2 * span - positions[i];
            }
        }
        return positions;
    }

    private record Piece(double startM, Material material) {
    }
}
