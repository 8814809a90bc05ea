package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.IntFunction;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.Reading;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.CriterionText;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.ValueText;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * The verdict on the result step: pass or fail in words (the colour only repeats them), the value
 * before and after against the limit, the margin, where it is worst and the zone before and after.
 * When the bare structure already passes, "no absorber is needed" comes first.
 */
final class VerdictPanel {
    private final JLabel headline = new JLabel(" ");
    private final JLabel details = new JLabel(" ");
    private final JPanel panel = new JPanel(new BorderLayout(0, 2));
    private Verdict shown;

    /**
     * The verdict in words.
     *
     * @param headline the first sentence, pass or fail in words
     * @param passes true when the design shown meets the criterion (or none is needed)
     * @param lines the sentences under it
     * @param criterion what is judged, the limit and its source (under the pointer, and in the table)
     */
    record Verdict(String headline, boolean passes, List<String> lines, String criterion) {
    }

    VerdictPanel() {
        headline.setName("result.verdict");
        details.setName("result.verdict.details");
        headline.setFont(headline.getFont().deriveFont(Font.BOLD));
        details.setFont(details.getFont().deriveFont(details.getFont().getSize2D() - 1f));
        panel.setBorder(BorderFactory.createEmptyBorder(2, 2, 6, 2));
        panel.add(headline, BorderLayout.NORTH);
        panel.add(details, BorderLayout.CENTER);
        panel.setVisible(false);
    }

    /** @return the panel */
    JComponent component() {
        return panel;
    }

    /** Hides the verdict: the project has no criterion (or no design is on screen). */
    void none() {
        shown = null;
        panel.setVisible(false);
    }

    /**
     * @param a the verdict of the design shown
     * @param orderName the words for an order by its index in the excitation's orders (0 = design order)
     */
    void show(Acceptance a, IntFunction<String> orderName) {
        shown = of(a, orderName);
        Color colour = shown.passes() ? Themes.passColour() : Themes.problemColour();
        headline.setForeground(colour);
        headline.setText(html(shown.headline(), 380));
        details.setForeground(UIManager.getColor("Label.foreground"));
        details.setText(html(String.join("\n", shown.lines()), 380));
        headline.setToolTipText(html(shown.criterion(), 380));
        details.setToolTipText(headline.getToolTipText());
        panel.setVisible(true);
    }

    /** @return the verdict shown, if any (for tests) */
    Optional<Verdict> shown() {
        return Optional.ofNullable(shown);
    }

    /**
     * @param a a verdict
     * @param orderName the words for an order by its index
     * @return the verdict in words
     */
    static Verdict of(Acceptance a, IntFunction<String> orderName) {
        Criterion c = a.criterion();
        Reading before = a.before();
        Reading after = a.after();
        List<String> lines = new ArrayList<>();
        String headline;
        boolean passes;
        if (!a.absorberNeeded()) {
            passes = true;
            headline = "No absorber is needed: the structure already meets the criterion without one ("
                    + margin(before) + ").";
            lines.add("Without the absorber: " + reading(c, before) + ".");
            lines.add("With the absorber: " + reading(c, after) + ".");
        } else if (after.passes()) {
            passes = true;
            headline = "Passes with the absorber: " + value(c, after.value()) + " against a limit of "
                    + value(c, after.limit()) + " (" + margin(after) + ").";
            lines.add("Without the absorber it fails: " + reading(c, before) + ".");
            zonesAfter(c, after).ifPresent(lines::add);
        } else {
            passes = false;
            headline = "Fails even with the absorber: " + value(c, after.value()) + " against a limit of "
                    + value(c, after.limit()) + " (" + excess(after) + ").";
            lines.add("Without the absorber: " + reading(c, before) + ".");
            zonesAfter(c, after).ifPresent(lines::add);
        }
        if (!after.unbounded()) {
            lines.add("Worst with the absorber at " + ValueText.frequency(after.worstFrequency()) + " forcing"
                    + after.governingOrder().stream().mapToObj(i -> ", governed by " + orderName.apply(i))
                            .findFirst().orElse("") + ".");
        }
        if (before.outsideRange() || after.outsideRange()) {
            lines.add("The worst point lies outside the criterion's frequency range: the limit's end value was"
                    + " used there.");
        }
        return new Verdict(headline, passes, lines, CriterionForm.describe(c));
    }

    /**
     * @param r a design
     * @param p the project it was designed from, or null
     * @return the words for an order by its index in the design's excitation, e.g. "the order 2\u00d7
     *     shaft speed"
     */
    static IntFunction<String> orderNames(DesignResult r, Project p) {
        return index -> {
            Excitation excitation = r.study().excitation();
            double shaft = Double.NaN;
            if (p != null) {
                DisturbanceInput d = p.disturbance();
                shaft = d.isBand() ? d.bandUnit().toSi(d.bandLow()) : d.frequency().unit().toSi(d.frequency().value());
            }
            double harmonic = excitation.orders().get(index).frequencyFactor() * excitation.band().low() / shaft;
            return Double.isFinite(harmonic) && harmonic > 0
                    ? "the order " + QuantityFormat.number(harmonic, 3) + "\u00d7 shaft speed"
                    : index == 0 ? "the design order" : "another order";
        };
    }

    private static Optional<String> zonesAfter(Criterion c, Reading after) {
        return after.zones().isEmpty() ? Optional.empty()
                : Optional.of("With the absorber: " + zones(c, after.zones()) + ".");
    }

    /** @return the zones (or comfort reactions) in the reports' words */
    private static String zones(Criterion c, List<String> ids) {
        return (c.kind() == CriterionKind.MACHINE ? "zone " : "\u201c") + CriterionText.zones(c, ids)
                + (c.kind() == CriterionKind.MACHINE ? "" : "\u201d");
    }

    private static String reading(Criterion c, Reading r) {
        String verdict = r.passes() ? "passes" : "fails";
        String zones = r.zones().isEmpty() ? "" : ", " + zones(c, r.zones());
        return value(c, r.value()) + " against " + value(c, r.limit()) + ", " + verdict
                + (r.unbounded() ? "" : " (" + (r.passes() ? margin(r) : excess(r)) + ")") + zones;
    }

    /** @return the value with its unit, convention and weighting; never "Infinity" */
    private static String value(Criterion c, double si) {
        if (Double.isInfinite(si)) {
            return "unbounded (an undamped resonance in the band)";
        }
        return QuantityField.pretty(DisplayUnits.format(si, c.quantity().dimension())) + " " + c.convention().label()
                + c.weighting().map(w -> " weighted " + w.symbol()).orElse("");
    }

    private static String margin(Reading r) {
        return "margin \u00d7" + QuantityFormat.number(r.marginRatio(), 3) + ", "
                + QuantityFormat.number(r.marginDecibels(), 3) + " dB";
    }

    private static String excess(Reading r) {
        if (r.unbounded()) {
            return "unbounded";
        }
        return "over the limit by \u00d7" + QuantityFormat.number(r.utilisation(), 3) + ", "
                + QuantityFormat.number(-r.marginDecibels(), 3) + " dB";
    }

    private static String html(String text, int widthPt) {
        return Html.wrapped(text, widthPt).replace("\n", "<br>");
    }
}
