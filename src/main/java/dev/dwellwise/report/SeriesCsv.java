package dev.dwellwise.report;

/** The series as CSV with a header row: the same columns and numbers as the JSON series. */
public final class SeriesCsv {

    public static final String HEADER = "timeSeconds,temperatureC,surfaceTemperatureC,coreTemperatureC,stageIndex";

    private SeriesCsv() {
    }

    public static String render(SeriesReport series) {
        StringBuilder out = new StringBuilder(64 + series.timeSeconds().length * 48);
        out.append(HEADER).append('\n');
        for (int i = 0; i < series.timeSeconds().length; i++) {
            out.append(series.timeSeconds()[i]).append(',')
                    .append(series.temperatureC()[i]).append(',')
                    .append(series.surfaceTemperatureC()[i]).append(',')
                    .append(series.coreTemperatureC()[i]).append(',')
                    .append(series.stageIndex()[i]).append('\n');
        }
        return out.toString();
    }
}
