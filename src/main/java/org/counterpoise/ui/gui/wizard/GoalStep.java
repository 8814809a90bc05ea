package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.util.List;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.FormSwitch;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.plot.ChartHost;

/** Step 3: how big the absorber may be, how to design it, and what response matters. */
final class GoalStep extends Step {
    private final JComboBox<String> sizing = new JComboBox<>(
            new String[] {"mass ratio \u03bc", "absorber mass", "lightest for a target response"});
    private final QuantityField size = new QuantityField("absorber.mass_ratio",
            "Absorber mass over the structure's effective mass, or the mass budget", UnitChoices.of(Dimension.RATIO));
    private final JComboBox<DesignMethod> method = new JComboBox<>(DesignMethod.values());
    private final JComboBox<ResponseKind> response = new JComboBox<>(
            Project.DESIGN_RESPONSES.toArray(new ResponseKind[0]));
    private final QuantityField margin = new QuantityField("absorber.stroke_margin",
            "Clearance to leave over the computed peak stroke (1.5 is common practice)", UnitChoices.of(Dimension.RATIO));
    private final JCheckBox hangs = new JCheckBox("the absorber hangs on its spring");
    private final QuantityField strokeLimit = new QuantityField("absorber.stroke_limit",
            "Largest allowed peak stroke in the band (exact-peak only); leave empty for none",
            UnitChoices.of(Dimension.LENGTH));
    private final JLabel methodNote = new JLabel(" ");
    {
        methodNote.setName("absorber.methodNote");
        methodNote.setForeground(new java.awt.Color(0xb0, 0x2a, 0x1e));
    }
    private final ChartHost massChart = new ChartHost("chart.massRatio");
    private final JComponent page;
    private SizingContext sizingContext = new SizingContext() {
        @Override
        public Structure structure() {
            return null;
        }

        @Override
        public DesignResult design() {
            return null;
        }
    };

    GoalStep(Runnable changed) {
        sizing.setName("absorber.sizing");
        method.setName("absorber.method");
        response.setName("absorber.response");
        hangs.setName("absorber.hangs");
        method.setRenderer(new javax.swing.DefaultListCellRenderer() {
            @Override
            public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                String text = value instanceof DesignMethod m ? m.id() + "  \u2014  " + m.description() : "";
                return super.getListCellRendererComponent(list, text, index, selected, focus);
            }
        });
        response.setRenderer(new javax.swing.DefaultListCellRenderer() {
            @Override
            public java.awt.Component getListCellRendererComponent(javax.swing.JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof ResponseKind r ? r.label() : "",
                        index, selected, focus);
            }
        });
        // The longest method description would make the form wider than a small screen; the open list shows it whole.
        java.awt.Dimension methodSize = method.getPreferredSize();
        method.setPreferredSize(new java.awt.Dimension(Math.min(methodSize.width, 460), methodSize.height));
        Form form = new Form();
        form.heading("The absorber you can fit");
        form.row("Size given as", 'z', sizing,
                "A mass ratio, a mass budget, or the response level to reach with the lightest absorber (exact-peak)");
        form.row("Value", 'v', size, "Mass ratio or mass");
        form.row("Design method", 'm', method, "How tuning and damping are chosen");
        form.row("Response that matters", 'r', response, "The response the design reduces");
        form.row("Stroke margin", 'n', margin, "Clearance over the computed stroke");
        form.row("Stroke limit (optional)", 't', strokeLimit, "Clearance available in the band, exact-peak only");
        form.row("", (char) 0, hangs, "Gives the static sag of the spring");
        form.derived("", methodNote);
        form.end();
        JPanel chartPanel = new JPanel(new BorderLayout());
        JLabel caption = new JLabel("  Least peak an optimally tuned absorber can reach, against its mass ratio");
        chartPanel.add(caption, BorderLayout.NORTH);
        chartPanel.add(massChart, BorderLayout.CENTER);
        javax.swing.JScrollPane formScroll = new javax.swing.JScrollPane(form);
        formScroll.setBorder(null);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, formScroll, chartPanel);
        split.setResizeWeight(0.55);
        split.setBorder(null);
        page = split;
        own("absorber.mass", size);
        own("absorber.mass_ratio", size);
        own("absorber", size);
        own("absorber.target", size);
        own("absorber.stroke_margin", margin);
        own("absorber.stroke_limit", strokeLimit);
        sizing.addActionListener(e -> {
            sizeUnits();
            changed.run();
        });
        method.addActionListener(e -> changed.run());
        response.addActionListener(e -> {
            if (sizing.getSelectedIndex() == 2) {
                sizeUnits();
            }
            changed.run();
        });
        hangs.addActionListener(e -> changed.run());
        size.onChange(changed);
        margin.onChange(changed);
        strokeLimit.onChange(changed);
        convertOnSizingChange();
    }

    private void sizeUnits() {
        size.setUnits(sizeUnits(sizing.getSelectedIndex()));
    }

    private List<Unit> sizeUnits(int sizingForm) {
        return switch (sizingForm) {
            case 0 -> UnitChoices.of(Dimension.RATIO);
            case 1 -> UnitChoices.of(Dimension.MASS);
            default -> UnitChoices.of(((ResponseKind) response.getSelectedItem()).dimension());
        };
    }

    /** What converting the size between its forms needs from the rest of the wizard. */
    interface SizingContext {
        /** @return the structure as entered, or null while it is not valid */
        Structure structure();

        /** @return the design on screen, or null */
        DesignResult design();
    }

    /** @param c where the structure and the design shown come from */
    void sizingContext(SizingContext c) {
        sizingContext = c;
    }

    /**
     * A change of sizing converts the value: a mass ratio becomes the absorber mass it means on the
     * structure's effective mass (never 0.05 kg), and a target starts from what the design on
     * screen reaches; attached after the other listeners, so it runs first.
     */
    private void convertOnSizingChange() {
        FormSwitch.attach(sizing, size, this::sizeUnits, (from, to, v) -> {
            Structure s = sizingContext.structure();
            DesignResult d = sizingContext.design();
            if (to == 2) {
                return d != null && d.study().response() == response.getSelectedItem() ? d.responseAfter().value()
                        : Double.NaN;
            }
            if (from == 2) {
                return d == null ? Double.NaN : to == 0 ? d.tuning().massRatio() : d.absorber().mass();
            }
            if (s == null) {
                return Double.NaN;
            }
            return to == 1 ? v * s.effectiveMass() : v / s.effectiveMass();
        }, i -> i == 0 ? "type the mass ratio" : i == 1 ? "type the absorber mass"
                : "type the largest " + ((ResponseKind) response.getSelectedItem()).label() + " you accept");
    }

    @Override
    String title() {
        return "Absorber goal";
    }

    @Override
    JComponent component() {
        return page;
    }

    ChartHost massChart() {
        return massChart;
    }

    DesignMethod method() {
        return (DesignMethod) method.getSelectedItem();
    }

    /**
     * @param keep constraints and target of the loaded project, carried over unchanged
     * @return the absorber choices
     */
    AbsorberInput input(AbsorberInput keep) {
        int kind = sizing.getSelectedIndex();
        double ratio = kind == 0 ? size.number() : Double.NaN;
        QuantityInput mass = kind == 1 ? size.input() : null;
        QuantityInput target = kind == 2 ? size.input() : null;
        DesignMethod m = method();
        boolean exact = m == DesignMethod.EXACT_PEAK;
        return new AbsorberInput(ratio, mass, m, (ResponseKind) response.getSelectedItem(), hangs.isSelected(),
                margin.number(), target, kind == 2 && keep != null ? keep.maxMassRatio() : Double.NaN,
                strokeLimit.textField().getText().isBlank() ? null : strokeLimit.input(),
                exact && keep != null ? keep.fixedDampingRatio() : Double.NaN,
                exact && keep != null ? keep.fixedTuningRatio() : Double.NaN);
    }

    void load(AbsorberInput a) {
        method.setSelectedItem(a.method());
        response.setSelectedItem(a.response());
        if (a.mass() != null) {
            sizing.setSelectedIndex(1);
            size.show(a.mass().value(), a.mass().unit());
        } else if (!Double.isNaN(a.massRatio())) {
            sizing.setSelectedIndex(0);
            size.show(a.massRatio(), Unit.RATIO);
        } else {
            sizing.setSelectedIndex(2);
            size.show(a.target().value(), a.target().unit());
        }
        margin.show(a.strokeMargin(), Unit.RATIO);
        if (a.strokeLimit() != null) {
            strokeLimit.show(a.strokeLimit().value(), a.strokeLimit().unit());
        } else {
            strokeLimit.clear();
        }
        hangs.setSelected(a.hangsVertically());
    }

    void note(String text) {
        methodNote.setText(text == null ? " " : "<html><body style='width: 440pt'>" + text
                .replace("&", "&amp;").replace("<", "&lt;") + "</body></html>");
    }

    /** Shows a problem on the method list (not a number field). */
    void methodProblem(String text) {
        method.putClientProperty("JComponent.outline", text == null ? null : "error");
        note(text);
    }
}
