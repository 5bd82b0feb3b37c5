package org.variset.web.chart;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

class ChartsTest {

    private static Document parse(String svg) throws Exception {
        // The JDK's own XML parser (javax.xml) reads the chart: it is well-formed SVG.
        return DocumentBuilderFactory.newInstance()
                .newDocumentBuilder()
                .parse(new java.io.ByteArrayInputStream(svg.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    }

    @Test
    void drawsBarsInProportionToTheirSharesWithTheTargetAsATick() throws Exception {
        String svg = Charts.bars(
                "Grades",
                List.of(new Charts.Bar("V1", 1, 0.25), new Charts.Bar("V2", 3, 0.5), new Charts.Bar("V3", 0, 0.25)));
        NodeList rects = parse(svg).getElementsByTagName("rect");
        double h1 = Double.parseDouble(
                rects.item(0).getAttributes().getNamedItem("height").getNodeValue());
        double h2 = Double.parseDouble(
                rects.item(1).getAttributes().getNamedItem("height").getNodeValue());
        double h3 = Double.parseDouble(
                rects.item(2).getAttributes().getNamedItem("height").getNodeValue());
        // Shares 1/4 and 3/4 of 4 routes: the tallest (3/4) fills the plot of 140 units, the other a third of it.
        assertThat(h2).isEqualTo(140.0);
        assertThat(h1).isCloseTo(140.0 / 3, org.assertj.core.data.Offset.offset(0.1));
        assertThat(h3).isZero();
        assertThat(svg).contains("class=\"target\"");
    }

    @Test
    void putsSectorZeroAtTheTopAndGoesClockwise() {
        int[] sectors = {4, 0, 1, 0, 0, 0, 0, 0};
        String svg = Charts.rose("Grips", sectors);
        Matcher m = Pattern.compile("<path class=\"wedge\" d=\"M110.0 110.0 L([-0-9.]+) ([-0-9.]+) A")
                .matcher(svg);
        assertThat(m.find()).isTrue();
        // Sector 0 (faces up) spans -22.5 to 22.5 degrees from straight up: its first corner is up and to the left.
        assertThat(Double.parseDouble(m.group(1))).isLessThan(110.0);
        assertThat(Double.parseDouble(m.group(2))).isLessThan(110.0 - 70);
        // Sector 2 (faces right) with a quarter of sector 0's count: radius 80 * sqrt(1/4) = 40, to the right.
        assertThat(svg).contains("A40.0 40.0");
        assertThat(svg).contains(">right 1<");
    }

    @Test
    void escapesTextAndDrawsEachGripOfAHold() throws Exception {
        String svg = Charts.sketch(
                "Holds of <b>X</b>",
                List.of(
                        new Charts.Mark(1.0, 1.0, List.of(0.0, 90.0), "hand crimp & \"pinch\"", false),
                        new Charts.Mark(1.5, 0.4, List.of(), "foot chip", true)));
        Document d = parse(svg);
        assertThat(d.getElementsByTagName("title").item(0).getTextContent()).isEqualTo("Holds of <b>X</b>");
        assertThat(d.getElementsByTagName("line").getLength()).isEqualTo(2);
        assertThat(d.getElementsByTagName("circle").getLength()).isEqualTo(2);
        assertThat(svg).doesNotContain("<b>");
    }
}
