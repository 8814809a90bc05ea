package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Component;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import org.counterpoise.core.criteria.AmplitudeConvention;
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
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.FormSwitch;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.field.Sizes;
import org.counterpoise.ui.gui.plot.ChartHost;

/** Step 3: how big the absorber may be, how to design it, and what response matters. */
final class GoalStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Absorber goal";
    /** The forms the absorber's size is given in, as the list offers them. */
    enum SizingForm {
        /** A mass ratio mu. */
        MASS_RATIO,
        /** An absorber mass. */
        MASS,
        /** The lightest absorber that meets the project's criterion. */
        MEET_CRITERION
    }

    private final JComboBox<SizingForm> sizing = new JComboBox<>(SizingForm.values());
    private final QuantityField size = new QuantityField("absorber.mass_ratio",
            "Absorber mass over the structure's effective mass, or the mass budget", UnitChoices.of(Dimension.RATIO));
    private final JComboBox<DesignMethod> method = new JComboBox<>(DesignMethod.values());
    private final JComboBox<ResponseKind> response = new JComboBox<>(
            Project.DESIGN_RESPONSES.toArray(new ResponseKind[0]));
    private final QuantityField margin = new QuantityField("absorber.stroke_margin",
            "Clearance to leave over the computed peak stroke (1.5 is common practice)", UnitChoices.of(Dimension.RATIO));
    private final JCheckBox hangs = new JCheckBox("the absorber hangs on its spring");
    private final QuantityField maxMassRatio = new QuantityField("absorber.max_mass_ratio",
            "To meet the criterion: the largest mass ratio to consider; leave empty for the default",
            UnitChoices.of(Dimension.RATIO));
    private final QuantityField fixedDamping = new QuantityField("absorber.fixed_damping_ratio",
            "Exact-peak only: an absorber damping ratio you must use; leave empty to optimise it", UnitChoices.of(Dimension.RATIO));
    private final QuantityField fixedTuning = new QuantityField("absorber.fixed_tuning_ratio",
            "Exact-peak only: a tuning ratio you must use; leave empty to optimise it", UnitChoices.of(Dimension.RATIO));
    /** Says why the stated limit was emptied, until a new one is typed. */
    private String targetNote;
    /** The criterion the result is judged against, and the lightest absorber may be sized to meet. */
    private final CriterionForm criterion;
    private final JComboBox<AmplitudeConvention> displayConvention = new JComboBox<>(AmplitudeConvention.values());
    private final QuantityField strokeLimit = new QuantityField("absorber.stroke_limit",
            "Largest allowed peak stroke in the band (exact-peak only); leave empty for none",
            UnitChoices.of(Dimension.LENGTH));
    private final JLabel methodNote = new JLabel(" ");
    {
        methodNote.setName("absorber.methodNote");
        methodNote.setForeground(Themes.problemColour());
    }
    /** The ranges the design must hold over (issue 12: stated with the goal, not only later). */
    private final ToleranceRangesForm ranges;
    private final ChartHost massChart = new ChartHost("chart.massRatio");
    private final JComponent page;
    private SizingContext sizingContext = new SizingContext() { };

    /** @param criterion the criterion's form @param ranges the tolerance ranges' (each made ahead: {@link Part}) */
    GoalStep(CriterionForm criterion, ToleranceRangesForm ranges) {
        this.criterion = criterion;
        this.ranges = ranges;
        sizing.setName("absorber.sizing");
        ItemWords.show(sizing, SizingForm.class, f -> switch (f) {
            case MASS_RATIO -> "mass ratio \u03bc";
            case MASS -> "absorber mass";
            case MEET_CRITERION -> "lightest that meets the criterion";
        });
        method.setName("absorber.method");
        response.setName("absorber.response");
        hangs.setName("absorber.hangs");
        method.setRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                String text = value instanceof DesignMethod m ? m.id() + "  \u2014  " + m.description() : "";
                return super.getListCellRendererComponent(list, text, index, selected, focus);
            }
        });
        response.setRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof ResponseKind r ? r.label() : "",
                        index, selected, focus);
            }
        });
        // The longest method description would make the form wider than a small screen; the open list shows it whole.
        var methodSize = method.getPreferredSize();
        // 340 leaves room for the criterion and the tolerance ranges beside the form at 1366 x 768.
        method.setPreferredSize(Sizes.of(Math.min(methodSize.width, 340), methodSize.height));
        Form form = new Form();
        form.heading("The absorber you can fit");
        form.row("Size given as", 'z', sizing,
                "A mass ratio, a mass budget, or the lightest absorber that meets the criterion (on the right)");
        form.row("Value", 'v', size, "Mass ratio or mass");
        form.row("Design method", 'm', method, "How tuning and damping are chosen");
        form.row("Response that matters", 'r', response, "The response the design reduces");
        form.row("Stroke margin", 'n', margin, "Clearance over the computed stroke");
        form.row("Stroke limit (optional)", 't', strokeLimit, "Largest stroke allowed from standstill to the top of the band (run-up too), exact-peak only");
        form.row("", (char) 0, hangs, "Gives the static deflection of the spring");
        form.row("Largest mass ratio (to meet)", 'x', maxMassRatio,
                "To meet the criterion: the search for the lightest absorber stops here; empty for the default");
        form.row("Fixed damping ratio \u03b6a", 'f', fixedDamping, "Exact-peak: empty to optimise, or the ratio to use");
        form.row("Fixed tuning ratio f", 'u', fixedTuning, "Exact-peak: empty to optimise, or the ratio to use");
        form.derived("", methodNote);
        form.end();
        Form rangesForm = new Form();
        displayConvention.setName("display.convention");
        ItemWords.show(displayConvention, AmplitudeConvention.class, CriterionWords::of);
        criterion.addTo(rangesForm, displayConvention);
        ranges.addTo(rangesForm);
        rangesForm.end();
        JPanel forms = new JPanel(new BorderLayout());
        forms.add(form, BorderLayout.WEST);
        forms.add(rangesForm, BorderLayout.CENTER);
        JPanel chartPanel = new JPanel(new BorderLayout());
        JLabel caption = new JLabel("  Least peak an optimally tuned absorber can reach, against its mass ratio");
        chartPanel.add(caption, BorderLayout.NORTH);
        chartPanel.add(massChart, BorderLayout.CENTER);
        JScrollPane formScroll = new JScrollPane(forms);
        formScroll.setBorder(null);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, formScroll, chartPanel);
        split.setResizeWeight(0.55);
        split.setBorder(null);
        page = split;
        own("absorber.mass", size);
        own("absorber.mass_ratio", size);
        own("absorber", size);
        own("absorber.target", size);
        own("acceptance.limit", criterion.limitField());
        own("absorber.stroke_margin", margin);
        own("absorber.stroke_limit", strokeLimit);
        own("absorber.max_mass_ratio", maxMassRatio);
        own("absorber.fixed_damping_ratio", fixedDamping);
        own("absorber.fixed_tuning_ratio", fixedTuning);
        sizing.addActionListener(e -> {
            sizeUnits();
            edited("absorber.sizing");
        });
        method.addActionListener(e -> edited("absorber.method"));
        response.addActionListener(e -> {
            // the response first: the criterion's edit that follows shows the project again
            edited("absorber.response");
            if (sizing.getSelectedItem() == SizingForm.MEET_CRITERION && !syncing()) {
                limitFollowsResponse();
            }
        });
        criterion.onChange(key -> {
            if (key.equals("acceptance.limit")) {
                commit(() -> ProjectEdits.acceptance(key, criterion.acceptance()));
            } else {
                commitChoice(() -> ProjectEdits.acceptance(key, criterion.acceptance()));
            }
        });
        criterion.responseThatMatters(() -> (ResponseKind) response.getSelectedItem());
        displayConvention.addActionListener(e -> commitChoice(() -> ProjectEdits.displayConvention("display.convention",
                (AmplitudeConvention) displayConvention.getSelectedItem())));
        hangs.addActionListener(e -> edited("absorber.hangs"));
        for (QuantityField f : List.of(size, margin, strokeLimit, maxMassRatio, fixedDamping, fixedTuning)) {
            f.onChange(() -> edited(f.fieldId()));
        }
        ranges.fieldsByKey().forEach(this::own);
        for (QuantityField f : ranges.fields()) {
            f.onChange(() -> editedRanges(f.fieldId()));
        }
        ranges.basis().addActionListener(e -> editedRanges(ranges.basis().getName()));
        convertOnSizingChange();
    }

    private void editedRanges(String key) {
        commit(() -> ProjectEdits.ranges(key, ranges.ranges()));
    }

    /**
     * The lightest absorber is sized for the response that matters, so a stated limit follows it; a
     * limit typed as a displacement means nothing as a velocity: when the quantity changes, the
     * limit is emptied (and said so) rather than read in the new unit.
     */
    private void limitFollowsResponse() {
        ResponseKind now = (ResponseKind) response.getSelectedItem();
        String note = criterion.follow(now);
        if (note != null) {
            targetNote = note;
            note(note);
        }
    }

    private void edited(String key) {
        if (!criterion.limitField().textField().getText().isBlank()) {
            targetNote = null;
        }
        commit(() -> ProjectEdits.absorber(key, input()));
    }

    @Override
    void showProject(Project p, boolean loaded) {
        if (loaded) {
            targetNote = null;
        }
        load(p.absorber());
        criterion.show(p.acceptance());
        selectItem(displayConvention, p.displayConvention());
        ranges.show(p);
    }

    @Override
    boolean fieldsValid() {
        boolean ok = check(margin);
        if (sizing.getSelectedItem() != SizingForm.MEET_CRITERION) {
            ok &= check(size);
        }
        if (criterion.needsLimit()) {
            ok &= check(criterion.limitField());
        }
        List<QuantityField> optional = new ArrayList<>(List.of(strokeLimit, maxMassRatio, fixedDamping, fixedTuning));
        optional.addAll(ranges.fields());
        for (QuantityField f : optional) {
            if (!f.textField().getText().isBlank()) {
                ok &= check(f);
            }
        }
        return ok;
    }

    private static OptionalDouble optional(QuantityField f) {
        return f.textField().getText().isBlank() ? OptionalDouble.empty() : OptionalDouble.of(f.number());
    }

    private void sizeUnits() {
        size.setUnits(sizeUnits((SizingForm) sizing.getSelectedItem()));
    }

    /** @param r a response @return the units its targets are typed in */
    static List<Unit> unitsOf(ResponseKind r) {
        return UnitChoices.of(r.dimension());
    }

    private List<Unit> sizeUnits(SizingForm sizingForm) {
        return switch (sizingForm) {
            case MASS_RATIO -> UnitChoices.of(Dimension.RATIO);
            case MASS -> UnitChoices.of(Dimension.MASS);
            case MEET_CRITERION -> List.of();
        };
    }

    /** What converting the size between its forms needs from the rest of the wizard. */
    interface SizingContext {
        /** @return the structure as entered, or null while it is not valid (none until the frame tells) */
        default Structure structure() {
            return null;
        }

        /** @return the design on screen, or null (none until the frame tells) */
        default DesignResult design() {
            return null;
        }
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
        FormSwitch.attachItems(sizing, size, this::sizeUnits, (from, to, v) -> {
            Structure s = sizingContext.structure();
            DesignResult d = sizingContext.design();
            if (to == SizingForm.MEET_CRITERION) {
                return Double.NaN;
            }
            if (from == SizingForm.MEET_CRITERION) {
                return d == null ? Double.NaN : to == SizingForm.MASS_RATIO ? d.tuning().massRatio() : d.absorber().mass();
            }
            if (s == null) {
                return Double.NaN;
            }
            return to == SizingForm.MASS ? v * s.effectiveMass() : v / s.effectiveMass();
        }, f -> switch (f) {
            case MASS_RATIO -> "type the mass ratio";
            case MASS -> "type the absorber mass";
            case MEET_CRITERION -> "nothing to type here: the criterion on the right sets the size, up to the"
                    + " largest mass ratio below";
        });
        sizing.addActionListener(e -> size.textField().setEnabled(sizing.getSelectedItem() != SizingForm.MEET_CRITERION));
    }

    @Override
    String title() {
        return TITLE;
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

    /** @return the absorber choices as shown (throws InvalidInputException naming a field) */
    AbsorberInput input() {
        SizingForm kind = (SizingForm) sizing.getSelectedItem();
        OptionalDouble ratio = kind == SizingForm.MASS_RATIO ? OptionalDouble.of(size.number()) : OptionalDouble.empty();
        QuantityInput mass = kind == SizingForm.MASS ? size.input() : null;
        return new AbsorberInput(ratio, mass, method(), (ResponseKind) response.getSelectedItem(), hangs.isSelected(),
                margin.number(), null, optional(maxMassRatio),
                strokeLimit.textField().getText().isBlank() ? null : strokeLimit.input(),
                optional(fixedDamping), optional(fixedTuning), kind == SizingForm.MEET_CRITERION);
    }

    private void load(AbsorberInput a) {
        if (method.getSelectedItem() != a.method()) {
            method.setSelectedItem(a.method());
        }
        if (response.getSelectedItem() != a.response()) {
            response.setSelectedItem(a.response());
        }
        if (a.mass() != null) {
            selectItem(sizing, SizingForm.MASS);
            showValue(size, a.mass());
        } else if (a.massRatio().isPresent()) {
            selectItem(sizing, SizingForm.MASS_RATIO);
            showValue(size, a.massRatio().getAsDouble(), Unit.RATIO);
        } else {
            selectItem(sizing, SizingForm.MEET_CRITERION);
            showValue(size, null);
        }
        size.textField().setEnabled(sizing.getSelectedItem() != SizingForm.MEET_CRITERION);
        showValue(margin, a.strokeMargin(), Unit.RATIO);
        showValue(strokeLimit, a.strokeLimit());
        showOptional(maxMassRatio, a.maxMassRatio());
        showOptional(fixedDamping, a.fixedDampingRatio());
        showOptional(fixedTuning, a.fixedTuningRatio());
        if (hangs.isSelected() != a.hangsVertically()) {
            hangs.setSelected(a.hangsVertically());
        }
    }

    private static void showOptional(QuantityField f, OptionalDouble v) {
        if (v.isPresent()) {
            showValue(f, v.getAsDouble(), Unit.RATIO);
        } else {
            showValue(f, null);
        }
    }

    void note(String text) {
        methodNote.setText(text == null ? " " : Html.wrapped(text, 440));
    }

    /** Shows a problem on the method list (not a number field). */
    void methodProblem(String text) {
        method.putClientProperty("JComponent.outline", text == null ? null : "error");
        note(text != null ? text : targetNote);
    }

    /** @param text a problem of the criterion (not of a number field), or null to clear it */
    void criterionProblem(String text) {
        criterion.problem(text);
    }
}
