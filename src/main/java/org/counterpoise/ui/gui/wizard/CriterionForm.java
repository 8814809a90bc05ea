package org.counterpoise.ui.gui.wizard;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;
import java.awt.Component;
import java.awt.Dimension;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.UIManager;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.BuildingAxis;
import org.counterpoise.core.criteria.BuildingVibration;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.EquipmentVibration;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.HumanComfort;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.io.project.AcceptanceInput;
import org.counterpoise.io.project.AcceptanceInput.CurvePoint;
import org.counterpoise.io.project.AcceptanceInput.Published;
import org.counterpoise.io.project.AcceptanceInput.StatedLimit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.CriterionText;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.field.Html;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;
import org.counterpoise.ui.gui.field.Sizes;

/**
 * The acceptance criterion as the absorber-goal step shows it: none, or one of the five families
 * with the choices of that family (a stated limit: quantity, convention, value and unit; comfort:
 * axis and the reaction accepted; a building: direction and room use; a machine: group, support
 * and the zone accepted; equipment: the curve). Only the chosen family's rows are shown. Below
 * them one line says what is judged, the limit and its source.
 */
final class CriterionForm {
    /** The families as the list offers them: none first. */
    enum Family {
        NONE, USER_LIMIT, HUMAN_COMFORT, BUILDING, MACHINE, EQUIPMENT;

        /** @return the family's kind (empty for none) */
        Optional<CriterionKind> kind() {
            return this == NONE ? Optional.empty() : Optional.of(CriterionKind.valueOf(name()));
        }

        static Family of(CriterionKind k) {
            return valueOf(k.name());
        }
    }

    /** What a first-time user starts from in each family (the usual acceptance, common practice). */
    private static final ComfortReaction FIRST_REACTION = ComfortReaction.A_LITTLE_UNCOMFORTABLE;
    private static final RoomUse FIRST_ROOM = RoomUse.GENERAL_OFFICE;
    private static final MachineClass FIRST_MACHINE = MachineClass.GROUP_2_RIGID;
    private static final SeverityZone FIRST_ZONE = SeverityZone.B;
    private static final VibrationCriterionCurve FIRST_CURVE = VibrationCriterionCurve.VC_A;

    /** The widest a list of this form is drawn closed, pixels before scaling. */
    private static final int LIST_WIDTH = 250;

    private final JComboBox<Family> family = new JComboBox<>(Family.values());
    private final JComboBox<ResponseKind> quantity = new JComboBox<>(Project.DESIGN_RESPONSES.stream()
            .filter(r -> !r.needsAbsorber()).toArray(ResponseKind[]::new));
    private final JComboBox<AmplitudeConvention> convention = new JComboBox<>(AmplitudeConvention.values());
    private final QuantityField limit = new QuantityField("acceptance.limit",
            "The largest value you accept, in the convention chosen", List.of());
    private final JComboBox<FrequencyWeighting> weighting = new JComboBox<>(
            new FrequencyWeighting[] {FrequencyWeighting.WK, FrequencyWeighting.WD});
    private final JComboBox<ComfortReaction> reaction = new JComboBox<>(Arrays.stream(ComfortReaction.values())
            .filter(r -> Double.isFinite(r.upper())).toArray(ComfortReaction[]::new));
    private final JComboBox<BuildingAxis> direction = new JComboBox<>(BuildingAxis.values());
    private final JComboBox<RoomUse> room = new JComboBox<>(RoomUse.values());
    private final JComboBox<MachineClass> machine = new JComboBox<>(MachineClass.values());
    private final JComboBox<SeverityZone> zone = new JComboBox<>(
            new SeverityZone[] {SeverityZone.A, SeverityZone.B, SeverityZone.C});
    private final JComboBox<VibrationCriterionCurve> curve = new JComboBox<>(VibrationCriterionCurve.values());
    private final JLabel summary = new JLabel(" ");
    private final JLabel problem = new JLabel(" ");
    /** The rows of each family, to show only the chosen one's. */
    private final List<Row> rows = new ArrayList<>();
    /** A stated limit that is a curve over frequency (from a file): kept while the value field is empty. */
    private List<CurvePoint> statedCurve;
    private Consumer<String> changed = key -> { };
    private Supplier<ResponseKind> responseThatMatters = () -> null;
    /** True while a project's criterion is shown (not a user's pick). */
    private boolean showing;

    private record Row(Family family, JLabel label, JComponent field) {
    }

    CriterionForm() {
        family.setName("acceptance.criterion");
        quantity.setName("acceptance.quantity");
        convention.setName("acceptance.convention");
        weighting.setName("acceptance.weighting");
        reaction.setName("acceptance.acceptable");
        direction.setName("acceptance.direction");
        room.setName("acceptance.room_use");
        machine.setName("acceptance.machine");
        zone.setName("acceptance.zone");
        curve.setName("acceptance.curve");
        summary.setName("acceptance.summary");
        problem.setName("acceptance.problem");
        problem.setForeground(Themes.problemColour());
        ItemWords.show(family, Family.class, f -> f.kind().map(CriterionWords::of).orElse("none: no verdict"));
        ItemWords.show(quantity, ResponseKind.class, ResponseKind::label);
        ItemWords.show(convention, AmplitudeConvention.class, CriterionWords::of);
        ItemWords.show(weighting, FrequencyWeighting.class, CriterionWords::of);
        ItemWords.show(reaction, ComfortReaction.class, CriterionWords::of);
        ItemWords.show(direction, BuildingAxis.class, CriterionWords::of);
        ItemWords.show(room, RoomUse.class, CriterionWords::of);
        ItemWords.show(machine, MachineClass.class, CriterionWords::of);
        ItemWords.show(zone, SeverityZone.class, CriterionWords::of);
        ItemWords.show(curve, VibrationCriterionCurve.class, CriterionWords::of);
        for (JComboBox<?> c : List.of(family, quantity, convention, weighting, reaction, direction, room, machine, zone,
                curve)) {
            // The form stands beside the absorber's at 1366 x 768: the open list shows long choices whole.
            Dimension size = c.getPreferredSize();
            c.setPreferredSize(Sizes.of(Math.min(size.width, LIST_WIDTH), size.height));
            // the closed list may cut a long choice short: its words stand whole under the pointer
            c.addActionListener(e -> wholeUnderPointer(c));
            wholeUnderPointer(c);
        }
        reaction.setSelectedItem(FIRST_REACTION);
        room.setSelectedItem(FIRST_ROOM);
        machine.setSelectedItem(FIRST_MACHINE);
        zone.setSelectedItem(FIRST_ZONE);
        curve.setSelectedItem(FIRST_CURVE);
        limitUnits();
        family.addActionListener(e -> {
            if (family.getSelectedItem() == Family.USER_LIMIT && !showing) {
                startUserLimitAs(responseThatMatters.get());
            }
            showFamilyRows();
            edited("acceptance.criterion");
        });
        quantity.addActionListener(e -> {
            limitUnits();
            edited("acceptance.quantity");
        });
        for (JComboBox<?> c : List.of(convention, weighting, reaction, direction, room, machine, zone, curve)) {
            c.addActionListener(e -> edited(c.getName()));
        }
        limit.onChange(() -> {
            if (!limit.textField().getText().isBlank()) {
                statedCurve = null; // a value typed replaces a curve from the file
            }
            edited("acceptance.limit");
        });
    }

    /**
     * Adds the rows to a form.
     * @param form the form
     * @param displayConvention the list of the display convention, shown under the criterion
     */
    void addTo(Form form, JComboBox<AmplitudeConvention> displayConvention) {
        form.heading("What the result is judged against");
        form.row("Criterion", 'c', family, "None, a limit you state, or a published criterion");
        add(form, Family.USER_LIMIT, "Quantity", 'q', quantity, "The response of the structure that is limited");
        add(form, Family.USER_LIMIT, "Stated as", 'e', convention, "Peak, r.m.s. or peak-to-peak");
        add(form, Family.USER_LIMIT, "Limit", 'i', limit, "The largest value you accept");
        add(form, Family.HUMAN_COMFORT, "Direction", 'd', weighting,
                "Wk for vertical, Wd for horizontal whole-body vibration (ISO 2631-1:1997)");
        add(form, Family.HUMAN_COMFORT, "Worst reaction accepted", 'w', reaction,
                "The judged value must stay within the upper end of this reaction's range (ISO 2631-1:1997 Annex C)");
        add(form, Family.BUILDING, "Direction", 'd', direction, "The direction of the vibration people feel");
        add(form, Family.BUILDING, "Room use", 'o', room, "The use sets the factor on the base curve (ISO 10137:2007)");
        add(form, Family.MACHINE, "Machine", 'h', machine, "Machine group by power, and its support");
        add(form, Family.MACHINE, "Worst zone accepted", 'w', zone,
                "B (unrestricted long-term operation) is the usual acceptance; A for a new machine");
        add(form, Family.EQUIPMENT, "Curve", 'u', curve, "The vibration criterion curve the equipment needs");
        summary.setForeground(UIManager.getColor("Label.disabledForeground"));
        form.derived("", summary);
        form.derived("", problem);
        form.row("Show values as", 'p', displayConvention,
                "Peak, r.m.s. or peak-to-peak: every response value on the result step and the charts says which");
        showFamilyRows();
    }

    private static <T> void wholeUnderPointer(JComboBox<T> c) {
        int index = c.getSelectedIndex();
        Component shown = index < 0 ? null : c.getRenderer().getListCellRendererComponent(new JList<T>(),
                c.getItemAt(index), -1, false, false);
        c.setToolTipText(shown instanceof JLabel l ? l.getText() : null);
    }

    private void add(Form form, Family f, String label, char mnemonic, JComponent field, String tooltip) {
        rows.add(new Row(f, form.row(label, mnemonic, field, tooltip), field));
    }

    private void showFamilyRows() {
        Family chosen = (Family) family.getSelectedItem();
        for (Row r : rows) {
            Form.showRow(r.label(), r.field(), r.family() == chosen);
        }
        describe();
    }

    private void limitUnits() {
        ResponseKind q = (ResponseKind) quantity.getSelectedItem();
        if (q != null && (limit.unit() == null || limit.unit().dimension() != q.dimension())) {
            limit.setUnits(UnitChoices.of(q.dimension()));
        }
    }

    private void edited(String key) {
        describe();
        changed.accept(key);
    }

    /** @param listener told the key of every change a user makes */
    void onChange(Consumer<String> listener) {
        changed = listener;
    }

    /** @return the value field, for the step's problem display */
    QuantityField limitField() {
        return limit;
    }

    /**
     * The stated limit follows the response that matters (the lightest absorber is sized for it):
     * the quantity becomes that response, and a value typed for another dimension is emptied, not
     * read in the new unit.
     * @param response the response that matters now
     * @return what was emptied and what to type, or null when nothing was
     */
    String follow(ResponseKind response) {
        ResponseKind was = selectedQuantity();
        if (family.getSelectedItem() != Family.USER_LIMIT || response == null || response.needsAbsorber()
                || was == response) {
            return null;
        }
        String text = limit.textField().getText().strip();
        if (was.dimension() == response.dimension() || text.isEmpty()) {
            Step.selectItem(quantity, response);
            return null;
        }
        String note = "The limit (" + text + " for the " + was.label() + ") was emptied: type the largest "
                + response.label() + " you accept.";
        // emptied before the quantity changes, so no edit reads it in the new unit
        limit.clearBecause(Character.toLowerCase(note.charAt(0)) + note.substring(1));
        Step.selectItem(quantity, response);
        return note;
    }

    /** @return true when a stated limit of one value is chosen: its field must hold a number */
    boolean needsLimit() {
        return family.getSelectedItem() == Family.USER_LIMIT && statedCurve == null;
    }

    /** @param response where the response that matters is read: a new stated limit starts as that quantity */
    void responseThatMatters(Supplier<ResponseKind> response) {
        responseThatMatters = response;
    }

    /**
     * A stated limit chosen by the user starts as the response that matters, and says what to type.
     * @param response the response that matters
     */
    private void startUserLimitAs(ResponseKind response) {
        if (limit.textField().getText().isBlank() && statedCurve == null) {
            if (response != null && !response.needsAbsorber()) {
                Step.selectItem(quantity, response);
            }
            limit.clearBecause("type the largest " + selectedQuantity().label() + " you accept");
        }
    }

    /**
     * @return the criterion as shown, or null for none
     * @throws InvalidInputException naming acceptance.limit when a stated limit is not a number
     */
    AcceptanceInput acceptance() {
        Family f = (Family) family.getSelectedItem();
        return switch (f) {
            case NONE -> null;
            case USER_LIMIT -> statedCurve != null && limit.textField().getText().isBlank()
                    ? new StatedLimit(selectedQuantity(), selectedConvention(), null, statedCurve)
                    : StatedLimit.flat(selectedQuantity(), selectedConvention(), limit.input());
            case HUMAN_COMFORT -> new Published(new HumanComfort((FrequencyWeighting) weighting.getSelectedItem(),
                    (ComfortReaction) reaction.getSelectedItem()));
            case BUILDING -> new Published(new BuildingVibration((BuildingAxis) direction.getSelectedItem(),
                    (RoomUse) room.getSelectedItem()));
            case MACHINE -> new Published(new MachineSeverity((MachineClass) machine.getSelectedItem(),
                    (SeverityZone) zone.getSelectedItem()));
            case EQUIPMENT -> new Published(new EquipmentVibration((VibrationCriterionCurve) curve.getSelectedItem()));
        };
    }

    private ResponseKind selectedQuantity() {
        return (ResponseKind) quantity.getSelectedItem();
    }

    private AmplitudeConvention selectedConvention() {
        return (AmplitudeConvention) convention.getSelectedItem();
    }

    /**
     * Shows a criterion (only what differs from the screen is touched).
     * @param a the criterion as the project holds it, or null for none
     */
    void show(AcceptanceInput a) {
        showing = true;
        try {
            Step.selectItem(family, a == null ? Family.NONE : Family.of(a.kind()));
        } finally {
            showing = false;
        }
        if (a instanceof StatedLimit u) {
            Step.selectItem(quantity, u.quantity());
            Step.selectItem(convention, u.convention());
            limitUnits();
            if (u.value() != null) {
                statedCurve = null;
                Step.showValue(limit, u.value());
            } else {
                statedCurve = u.curve();
                Step.showValue(limit, null);
            }
        } else if (a instanceof Published published) {
            Criterion shown = published.criterion();
            if (shown instanceof HumanComfort h) {
                Step.selectItem(weighting, h.axisWeighting());
                Step.selectItem(reaction, h.acceptable());
            } else if (shown instanceof BuildingVibration b) {
                Step.selectItem(direction, b.axis());
                Step.selectItem(room, b.use());
            } else if (shown instanceof MachineSeverity m) {
                Step.selectItem(machine, m.machine());
                Step.selectItem(zone, m.acceptable());
            } else if (shown instanceof EquipmentVibration e) {
                Step.selectItem(curve, e.curve());
            }
        }
        describe();
    }

    /** Says what is judged, against which limit, and where the values come from. */
    private void describe() {
        AcceptanceInput a;
        Criterion c;
        try {
            a = acceptance();
            c = a == null ? null : a.toCriterion();
        } catch (InvalidInputException e) {
            summary.setText(" ");
            return;
        }
        summary.setText(html(c == null ? "The result is shown without a verdict." : describe(c)));
    }

    /**
     * @param c a criterion
     * @return one or two sentences: what is judged, the limit, the source and its caution
     */
    static String describe(Criterion c) {
        return "Judged: " + CriterionText.measure(c) + ", " + limitWords(c) + ". Source: " + CriterionText.source(c)
                + ".";
    }

    private static String limitWords(Criterion c) {
        LimitCurve l = c.limit();
        return l.isFlat() ? "limit " + QuantityField.pretty(DisplayUnits.format(l.at(1.0), c.quantity().dimension()))
                : "limit a curve from " + QuantityFormat.number(l.lowFrequency(), 3) + " to "
                        + QuantityFormat.number(l.highFrequency(), 3) + " Hz (" + l.points().size() + " points)";
    }

    private static String html(String text) {
        return Html.wrapped(text, 220);
    }

    /** @param text a problem of the criterion (not of its number field), or null to clear it */
    void problem(String text) {
        problem.setText(text == null ? " " : html(text));
        family.putClientProperty("JComponent.outline", text == null ? null : "error");
    }
}
