package dev.dwellwise.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.dwellwise.http.Services;
import dev.dwellwise.job.Job;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The SVG chart is well-formed, plots every sample, shows every stage and limit, and is deterministic. */
class SeriesSvgTest {

    private final Services services = Services.bundled();

    @Test
    void theChartPlotsEverySampleWithOneBandPerStageAndTheLimitLines() throws Exception {
        Job job = services.examples().find("e-coat-bracket-ramped-oven").orElseThrow().job();
        SimulationResult result = services.simulator().simulate(job);
        String svg = SeriesSvg.render(result, job.limits());

        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc = factory.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        assertEquals("svg", doc.getDocumentElement().getTagName());

        NodeList lines = doc.getElementsByTagName("polyline");
        assertEquals(1, lines.getLength(), "lumped: one temperature line");
        String points = ((Element) lines.item(0)).getAttribute("points");
        assertEquals(result.series().timeSeconds().length, points.split(" ").length);

        for (StageReport stage : result.stages()) {
            assertTrue(svg.contains(">" + stage.name() + "<"), stage.name());
        }
        assertTrue(svg.contains("max part 200 °C") && svg.contains("handling 43 °C"));

        // the chart carries the answer's cautions: all of them in its description, the gist in view
        assertEquals(String.join(" ", result.cautions()),
                doc.getElementsByTagName("desc").item(0).getTextContent());
        boolean shown = false;
        NodeList texts = doc.getElementsByTagName("text");
        for (int i = 0; i < texts.getLength(); i++) {
            shown |= texts.item(i).getTextContent().equals(SeriesSvg.SHORT_CAUTION);
        }
        assertTrue(shown, "the short caution is drawn");
        assertTrue(SeriesSvg.SHORT_CAUTION.contains("ISO 13732-1") && SeriesSvg.SHORT_CAUTION.contains("local codes"));
        assertEquals(svg, SeriesSvg.render(services.simulator().simulate(job), job.limits()));
    }

    @Test
    void axesGetRoundSteps() {
        double[] axis = SeriesSvg.niceAxis(18, 203);
        assertEquals(0, axis[0], 0);
        assertEquals(250, axis[1], 0);
        assertEquals(50, axis[2], 0);
    }
}
