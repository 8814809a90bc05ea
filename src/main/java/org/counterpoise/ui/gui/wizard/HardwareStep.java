package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.stream.IntStream;
import javax.swing.BorderFactory;
import javax.swing.DefaultComboBoxModel;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.realisation.Conductor;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.EddyCurrentChoice;
import org.counterpoise.core.realisation.ElastomerChoice;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * Step 4: the hardware the design is realised with ({@link Project#hardware()}): the spring, the
 * damper and what the workshop and the site can hold. Its own step, after the design's inputs and
 * before the result, because it changes nothing in the design (mass, tuning, damping) but only how
 * the design is built; the parts and checks it gives are on the result step's Hardware tab. The
 * damper list offers only what goes with the spring: an elastomer element damps by its own loss,
 * helical springs need a dashpot or an eddy-current damper, so the invalid pair cannot be picked.
 */
final class HardwareStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Hardware";
    private final JComboBox<SpringKind> spring = new JComboBox<>(SpringKind.values());
    private final JComboBox<SpringMaterial> material = new JComboBox<>(SpringMaterial.values());
    private final JComboBox<Integer> count = new JComboBox<>(
            IntStream.rangeClosed(0, HardwareChoice.MOST_SPRINGS).boxed().toArray(Integer[]::new));
    private final JComboBox<DamperKind> damper = new JComboBox<>();
    private final JComboBox<Conductor> conductor = new JComboBox<>(Conductor.values());
    private final QuantityField flux = new QuantityField("hardware.eddy_current.flux_density",
            "Magnetic flux density across the gap (permanent-magnet gaps give about 0.3 to 1 T)",
            UnitChoices.of(Dimension.FLUX_DENSITY));
    private final QuantityField plate = new QuantityField("hardware.eddy_current.plate_thickness",
            "Thickness of the conducting plate that moves through the gap", UnitChoices.of(Dimension.LENGTH));
    private final QuantityField ratio = new QuantityField("hardware.elastomer.dynamic_to_static_ratio",
            "Dynamic stiffness at the working frequency over static stiffness (about 1.1 to 1.3 for soft natural"
                    + " rubber, 2 or more for hard or highly damped compounds; common practice)",
            UnitChoices.of(Dimension.RATIO));
    private final QuantityField loss = new QuantityField("hardware.elastomer.loss_factor",
            "The loss factor of the compound the workshop will use, at the working frequency and temperature",
            UnitChoices.of(Dimension.RATIO));
    private final QuantityField hours = new QuantityField("hardware.service_hours",
            "Running hours the absorber must last: the spring's fatigue check counts these hours at the forcing"
                    + " frequency", List.of());
    private final QuantityField massTolerance = new QuantityField("hardware.mass_tolerance",
            "The tolerance the workshop holds on the absorber mass, percent each way", List.of(Unit.PERCENT));
    private final QuantityField trim = new QuantityField("hardware.trim_step",
            "One trim plate's mass, percent of the absorber mass", List.of(Unit.PERCENT));
    private final Form form = new Form();
    private final JLabel materialLabel;
    private final JLabel countLabel;
    private final List<JLabel> eddyLabels;
    private final List<JLabel> elastomerLabels;
    private final JComponent page;
    /** The damper helical springs had last, brought back when the spring is helical again. */
    private DamperKind helicalDamper = DamperKind.VISCOUS_DASHPOT;
    private boolean rebuilding;

    HardwareStep() {
        name(spring, "hardware.spring");
        name(material, "hardware.spring_material");
        name(count, "hardware.spring_count");
        name(damper, "hardware.damper");
        name(conductor, "hardware.eddy_current.conductor");
        ItemWords.show(spring, SpringKind.class, HardwareWords::of);
        ItemWords.show(material, SpringMaterial.class, HardwareWords::of);
        ItemWords.show(count, Integer.class, HardwareWords::springCount);
        ItemWords.show(damper, DamperKind.class, HardwareWords::of);
        ItemWords.show(conductor, Conductor.class, HardwareWords::of);
        dampersFor(SpringKind.HELICAL_COMPRESSION);
        form.heading("Spring");
        form.row("Resilient element", 'e', spring, "Helical steel springs, or an elastomer element that also damps");
        materialLabel = form.row("Wire", 'w', material, "Spring wire to EN 10270 (shear modulus and strength from"
                + " the standard)");
        countLabel = form.row("Springs in parallel", 'p', count, "Several springs share the load where one would be"
                + " too stiff or too stressed; springs in opposed pairs take the next even count");
        elastomerLabels = List.of(
                form.row("Dynamic-to-static ratio", 'y', ratio, "Rises with frequency, falls with temperature"),
                form.row("Compound loss factor \u03b7", 'l', loss, "Compared with the loss factor the design needs"));
        form.heading("Damper");
        form.row("Damping by", 'd', damper, "How the damping coefficient is realised");
        eddyLabels = List.of(
                form.row("Plate", 'c', conductor, "Plate material and its conductivity at 20 \u00b0C"),
                form.row("Flux density in the gap", 'x', flux, "The damper's pole area follows from it"),
                form.row("Plate thickness", 'k', plate, "The conducting plate's thickness"));
        form.heading("Workshop and site");
        form.row("Service life (running hours)", 'h', hours, "Hours the spring must last under the forcing");
        form.row("Absorber mass held to \u00b1", 'm', massTolerance, "Workshop tolerance on the absorber mass");
        form.row("Trim plate", 't', trim, "One trim plate's mass as a percent of the absorber mass");
        JLabel note = new JLabel("<html><body style='width: 300pt'>These choices change nothing in the design"
                + " (mass, tuning, damping): they say how it is built. The parts, their checks, the tolerances,"
                + " the trim and the tuning procedure are on the Result step, tab Hardware.</body></html>");
        note.setName("hardware.note");
        form.derived("", note);
        form.end();
        JPanel p = new JPanel(new BorderLayout());
        p.setBorder(BorderFactory.createEmptyBorder(4, 4, 4, 4));
        p.add(form, BorderLayout.CENTER);
        page = p;
        for (QuantityField f : fields()) {
            own(f.fieldId(), f);
            f.onChange(() -> commit(() -> ProjectEdits.hardware(f.fieldId(), choice())));
        }
        spring.addActionListener(e -> {
            dampersFor((SpringKind) spring.getSelectedItem());
            showRows();
            picked("hardware.spring");
        });
        damper.addActionListener(e -> {
            if (!rebuilding && damper.getSelectedItem() != DamperKind.ELASTOMER_LOSS) {
                helicalDamper = (DamperKind) damper.getSelectedItem();
            }
            showRows();
            picked("hardware.damper");
        });
        material.addActionListener(e -> picked("hardware.spring_material"));
        count.addActionListener(e -> picked("hardware.spring_count"));
        conductor.addActionListener(e -> picked("hardware.eddy_current.conductor"));
        showRows();
    }

    private static void name(JComponent c, String id) {
        c.setName(id);
    }

    private List<QuantityField> fields() {
        return List.of(flux, plate, ratio, loss, hours, massTolerance, trim);
    }

    private void picked(String key) {
        if (!rebuilding) {
            commitChoice(() -> ProjectEdits.hardware(key, choice()));
        }
    }

    /** The damper list holds only what goes with the spring: the invalid pair is never offered. */
    private void dampersFor(SpringKind kind) {
        rebuilding = true;
        try {
            if (kind == SpringKind.ELASTOMER) {
                damper.setModel(new DefaultComboBoxModel<>(new DamperKind[] {DamperKind.ELASTOMER_LOSS}));
                damper.setEnabled(false);
                damper.setToolTipText("An elastomer element damps by its own loss: no separate damper");
            } else {
                damper.setModel(new DefaultComboBoxModel<>(
                        new DamperKind[] {DamperKind.VISCOUS_DASHPOT, DamperKind.EDDY_CURRENT}));
                damper.setSelectedItem(helicalDamper);
                damper.setEnabled(true);
                damper.setToolTipText("How the damping coefficient is realised");
            }
        } finally {
            rebuilding = false;
        }
    }

    private void showRows() {
        boolean helical = spring.getSelectedItem() == SpringKind.HELICAL_COMPRESSION;
        Form.showRow(materialLabel, material, helical);
        Form.showRow(countLabel, count, helical);
        Form.showRow(elastomerLabels.get(0), ratio, !helical);
        Form.showRow(elastomerLabels.get(1), loss, !helical);
        boolean eddy = damper.getSelectedItem() == DamperKind.EDDY_CURRENT;
        Form.showRow(eddyLabels.get(0), conductor, eddy);
        Form.showRow(eddyLabels.get(1), flux, eddy);
        Form.showRow(eddyLabels.get(2), plate, eddy);
        form.revalidate();
        form.repaint();
    }

    /**
     * @return the choices as shown
     * @throws InvalidInputException naming the field that is not a number or out of range (in the unit shown)
     */
    HardwareChoice choice() {
        SpringKind kind = (SpringKind) spring.getSelectedItem();
        DamperKind d = kind == SpringKind.ELASTOMER ? DamperKind.ELASTOMER_LOSS : helicalDamper;
        EddyCurrentChoice eddy = new EddyCurrentChoice((Conductor) conductor.getSelectedItem(),
                flux.unit().toSi(flux.number()),
                inRange(plate, EddyCurrentChoice.THINNEST_PLATE, EddyCurrentChoice.THICKEST_PLATE));
        ElastomerChoice elastomer = new ElastomerChoice(ratio.number(), loss.number());
        return new HardwareChoice(kind, (SpringMaterial) material.getSelectedItem(), (Integer) count.getSelectedItem(),
                d, eddy, elastomer, hours.number(), inRange(massTolerance, 0, HardwareChoice.LARGEST_MASS_TOLERANCE),
                inRange(trim, HardwareChoice.SMALLEST_TRIM_STEP, HardwareChoice.LARGEST_TRIM_STEP));
    }

    /**
     * The record checks its bounds in SI; here they are said in the unit on screen (20 %, not 0.2).
     * @return the field's value, SI
     */
    private static double inRange(QuantityField f, double lowSi, double highSi) {
        double typed = f.number();
        Unit u = f.unit();
        double si = u.toSi(typed);
        if (!(si >= lowSi && si <= highSi)) {
            String symbol = u.symbol().isEmpty() ? "" : " " + QuantityField.pretty(u.symbol());
            throw new InvalidInputException(f.fieldId(), plain(typed) + symbol, "must lie between "
                    + plain(u.fromSi(lowSi)) + symbol + " and " + plain(u.fromSi(highSi)) + symbol);
        }
        return si;
    }

    /** @return the number to six figures, without trailing zeros (20, not 20.000000000000004) */
    private static String plain(double v) {
        return new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }

    @Override
    void showProject(Project p, boolean loaded) {
        HardwareChoice h = p.hardware();
        if (h.damperKind() != DamperKind.ELASTOMER_LOSS) {
            helicalDamper = h.damperKind();
        }
        rebuilding = true;
        try {
            selectItem(spring, h.springKind());
            dampersFor(h.springKind());
            rebuilding = true;
            selectItem(damper, h.damperKind());
            selectItem(material, h.springMaterial());
            selectItem(count, h.springCount());
            selectItem(conductor, h.eddyCurrent().conductor());
        } finally {
            rebuilding = false;
        }
        showInUnit(flux, h.eddyCurrent().fluxDensity(), displayed(Dimension.FLUX_DENSITY, p.displayUnits()));
        showInUnit(plate, h.eddyCurrent().plateThickness(), displayed(Dimension.LENGTH, p.displayUnits()));
        showValue(ratio, h.elastomer().dynamicToStaticRatio(), Unit.RATIO);
        showValue(loss, h.elastomer().compoundLossFactor(), Unit.RATIO);
        showValue(hours, h.serviceHours(), null);
        showInUnit(massTolerance, h.massTolerance(), Unit.PERCENT);
        showInUnit(trim, h.trimStepFraction(), Unit.PERCENT);
        showRows();
    }

    /** Shows an SI value in a unit, unless the field already holds that value (in whatever unit it shows). */
    private static void showInUnit(QuantityField f, double si, Unit unit) {
        double shown = f.siOrNaN();
        if (Double.isNaN(shown) || Math.abs(shown - si) > 1e-12 * Math.abs(si)) {
            f.show(unit.fromSi(si), unit);
        }
    }

    /** @return the unit a new value of the dimension is shown in, in the project's unit system */
    private static Unit displayed(Dimension dimension, UnitSystem system) {
        return DisplayUnits.of(dimension, system);
    }

    @Override
    boolean fieldsValid() {
        boolean ok = true;
        for (QuantityField f : fields()) {
            ok &= check(f);
        }
        if (ok) {
            try {
                choice();
            } catch (InvalidInputException e) {
                showProblem(e);
                return false;
            }
        }
        return ok;
    }

    @Override
    String title() {
        return TITLE;
    }

    @Override
    JComponent component() {
        return page;
    }
}
