package dev.dwellwise.report;

import dev.dwellwise.job.Limits;
import dev.dwellwise.thermal.DecimalText;
import java.util.List;

/**
 * The history as an SVG chart for the dashboard: temperature against time, the stages as bands,
 * the limits as dashed lines, the verdict in the title with the answer's cautions under it. Plain
 * SVG 1.1 with no scripts or external references, written with fixed-precision numbers so the same
 * result gives the same bytes.
 */
public final class SeriesSvg {

    private static final int WIDTH = 900;
    private static final int HEIGHT = 420;
    private static final int LEFT = 64;
    private static final int RIGHT = 24;
    private static final int TOP = 44;
    private static final int BOTTOM = 48;
    /**
     * A chart is looked at, not parsed: it carries the answer's cautions in its description and this
     * line where the eye falls, under the verdict.
     */
    static final String SHORT_CAUTION = "Estimate: confirm with a logged part profile; the coating supplier's data "
            + "governs cure; hot parts burn (ISO 13732-1); oven safety per local codes";
    private static final String[] BAND_FILLS = {"#eef3f8", "#f8f3ea"};

    private SeriesSvg() {
    }

    public static String render(SimulationResult result, Limits limits) {
        SeriesReport s = result.series();
        double tMax = Math.max(result.totalSeconds(), 1e-9);
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (double[] column : List.of(s.temperatureC(), s.surfaceTemperatureC(), s.coreTemperatureC())) {
            for (double v : column) {
                low = Math.min(low, v);
                high = Math.max(high, v);
            }
        }
        for (Double limit : new Double[] {limits.maxPartTemperatureC(), limits.handlingTemperatureC()}) {
            if (limit != null) {
                low = Math.min(low, limit);
                high = Math.max(high, limit);
            }
        }
        double headroom = 0.04 * Math.max(high - low, 1);
        double[] axis = niceAxis(low - headroom, high + headroom);
        Plot plot = new Plot(tMax, axis[0], axis[1]);

        StringBuilder out = new StringBuilder(16_384);
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"").append(WIDTH).append("\" height=\"")
                .append(HEIGHT).append("\" viewBox=\"0 0 ").append(WIDTH).append(' ').append(HEIGHT)
                .append("\" font-family=\"sans-serif\" font-size=\"12\">\n");
        out.append("<title>Part temperature history: verdict ").append(result.verdict()).append("</title>\n");
        out.append("<desc>").append(escape(String.join(" ", result.cautions()))).append("</desc>\n");
        out.append("<rect width=\"100%\" height=\"100%\" fill=\"#ffffff\"/>\n");
        for (int i = 0; i < result.stages().size(); i++) {
            StageReport stage = result.stages().get(i);
            double x0 = plot.x(stage.startSeconds());
            double x1 = plot.x(stage.endSeconds());
            out.append("<rect x=\"").append(f(x0)).append("\" y=\"").append(TOP).append("\" width=\"")
                    .append(f(Math.max(0, x1 - x0))).append("\" height=\"").append(HEIGHT - TOP - BOTTOM)
                    .append("\" fill=\"").append(BAND_FILLS[i % 2]).append("\"/>\n");
            out.append("<text x=\"").append(f(x0 + 4)).append("\" y=\"").append(TOP + 14)
                    .append("\" fill=\"#555555\">").append(escape(stage.name())).append("</text>\n");
        }
        grid(out, plot, axis);
        limitLine(out, plot, limits.maxPartTemperatureC(), "max part", "#b3261e");
        limitLine(out, plot, limits.handlingTemperatureC(), "handling", "#8a5a00");
        boolean uniform = java.util.Arrays.equals(s.surfaceTemperatureC(), s.coreTemperatureC());
        if (!uniform) {
            line(out, plot, s.timeSeconds(), s.surfaceTemperatureC(), "#d9822b", "surface");
            line(out, plot, s.timeSeconds(), s.coreTemperatureC(), "#2b6cb0", "core");
        }
        line(out, plot, s.timeSeconds(), s.temperatureC(), "#1a1a1a", uniform ? "part" : "mean");
        out.append("<text x=\"").append(LEFT).append("\" y=\"24\" font-size=\"15\" font-weight=\"bold\">")
                .append("Part temperature, model ").append(escape(result.model().used())).append(", verdict ")
                .append(escape(result.verdict())).append("</text>\n");
        out.append("<text x=\"").append(LEFT).append("\" y=\"38\" font-size=\"11\" fill=\"#b3261e\">")
                .append(escape(SHORT_CAUTION)).append("</text>\n");
        out.append("<text x=\"").append(WIDTH / 2).append("\" y=\"").append(HEIGHT - 10)
                .append("\" text-anchor=\"middle\">time (s)</text>\n");
        out.append("<text x=\"16\" y=\"").append(HEIGHT / 2).append("\" text-anchor=\"middle\" transform=\"rotate(-90 16 ")
                .append(HEIGHT / 2).append(")\">temperature (°C)</text>\n");
        out.append("</svg>\n");
        return out.toString();
    }

    private static void grid(StringBuilder out, Plot plot, double[] axis) {
        for (double v = axis[0]; v <= axis[1] + 1e-9; v += axis[2]) {
            double y = plot.y(v);
            out.append("<line x1=\"").append(LEFT).append("\" x2=\"").append(WIDTH - RIGHT).append("\" y1=\"")
                    .append(f(y)).append("\" y2=\"").append(f(y)).append("\" stroke=\"#dddddd\"/>\n");
            out.append("<text x=\"").append(LEFT - 6).append("\" y=\"").append(f(y + 4))
                    .append("\" text-anchor=\"end\">").append(trim(v)).append("</text>\n");
        }
        double[] time = niceAxis(0, plot.tMax);
        for (double t = 0; t <= plot.tMax + 1e-9; t += time[2]) {
            double x = plot.x(t);
            out.append("<text x=\"").append(f(x)).append("\" y=\"").append(HEIGHT - BOTTOM + 16)
                    .append("\" text-anchor=\"middle\">").append(trim(t)).append("</text>\n");
        }
        out.append("<rect x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"")
                .append(WIDTH - LEFT - RIGHT).append("\" height=\"").append(HEIGHT - TOP - BOTTOM)
                .append("\" fill=\"none\" stroke=\"#888888\"/>\n");
    }

    private static void limitLine(StringBuilder out, Plot plot, Double limit, String label, String colour) {
        if (limit == null) {
            return;
        }
        double y = plot.y(limit);
        out.append("<line x1=\"").append(LEFT).append("\" x2=\"").append(WIDTH - RIGHT).append("\" y1=\"").append(f(y))
                .append("\" y2=\"").append(f(y)).append("\" stroke=\"").append(colour)
                .append("\" stroke-dasharray=\"6 4\"/>\n");
        out.append("<text x=\"").append(WIDTH - RIGHT - 4).append("\" y=\"").append(f(y - 4))
                .append("\" text-anchor=\"end\" fill=\"").append(colour).append("\">").append(label).append(' ')
                .append(trim(limit)).append(" °C</text>\n");
    }

    private static void line(StringBuilder out, Plot plot, double[] t, double[] v, String colour, String name) {
        out.append("<polyline fill=\"none\" stroke=\"").append(colour).append("\" stroke-width=\"2\" points=\"");
        for (int i = 0; i < t.length; i++) {
            out.append(i == 0 ? "" : " ").append(f(plot.x(t[i]))).append(',').append(f(plot.y(v[i])));
        }
        out.append("\"><title>").append(name).append("</title></polyline>\n");
    }

    /** Axis from low to high with a round step: {start, end, step}. */
    static double[] niceAxis(double low, double high) {
        if (!(high > low)) {
            high = low + 1;
        }
        double raw = (high - low) / 6;
        double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = magnitude;
        for (double m : new double[] {1, 2, 2.5, 5, 10}) {
            if (raw <= m * magnitude) {
                step = m * magnitude;
                break;
            }
        }
        return new double[] {Math.floor(low / step) * step, Math.ceil(high / step) * step, step};
    }

    private static String f(double v) {
        return DecimalText.fixed(v, 1);
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : DecimalText.fixed(v, 1);
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    /** Data to drawing coordinates. */
    private record Plot(double tMax, double low, double high) {
        double x(double t) {
            return LEFT + (WIDTH - LEFT - RIGHT) * t / tMax;
        }

        double y(double c) {
            return HEIGHT - BOTTOM - (HEIGHT - TOP - BOTTOM) * (c - low) / (high - low);
        }
    }
}
