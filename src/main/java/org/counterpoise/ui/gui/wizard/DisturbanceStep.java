package org.counterpoise.ui.gui.wizard;

import java.util.List;
import javax.swing.ButtonGroup;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.FormSwitch;
import org.counterpoise.ui.gui.field.QuantityField;

/** Step 2: what shakes the structure, and at which speeds. */
final class DisturbanceStep extends Step {
    /** Index of the broadband choice in the kind list (a white-noise force). */
    static final int BROADBAND = 4;
    private static final List<Unit> FREQUENCY = UnitChoices.of(Dimension.FREQUENCY);
    private static final List<Unit> RATIO = UnitChoices.of(Dimension.RATIO);

    private final JComboBox<String> kind = new JComboBox<>(new String[] {"harmonic force", "rotating unbalance",
        "base displacement", "base acceleration", "broadband force (white noise)"});
    private final QuantityField amplitude = new QuantityField("disturbance.amplitude",
            "Force amplitude; unbalance m\u00b7e; or base motion amplitude", units(ExcitationKind.FORCE));
    private final JRadioButton oneSpeed = new JRadioButton("one speed");
    private final JRadioButton speedRange = new JRadioButton("speed range");
    private final QuantityField speed = new QuantityField("disturbance.frequency",
            "Shaft speed (or forcing frequency when the harmonic order is 1)", FREQUENCY);
    private final QuantityField low = new QuantityField("disturbance.band.low", "Lowest shaft speed", FREQUENCY);
    private final QuantityField high = new QuantityField("disturbance.band.high", "Highest shaft speed",
            RATIO);
    private final QuantityField order = new QuantityField("disturbance.harmonic_order",
            "Forcing cycles per revolution: 1 for unbalance, the blade count for blade-pass", RATIO);
    private final JLabel derivedBand = StructureStep.derived("derived.forcing");
    private final JLabel derivedRatio = StructureStep.derived("derived.ratio");
    private final JComponent page;

    DisturbanceStep() {
        kind.setName("disturbance.kind");
        oneSpeed.setName("disturbance.oneSpeed");
        speedRange.setName("disturbance.speedRange");
        ButtonGroup g = new ButtonGroup();
        g.add(oneSpeed);
        g.add(speedRange);
        oneSpeed.setSelected(true);
        Form form = new Form();
        form.heading("The disturbance");
        form.row("Kind", 'k', kind, "What drives the structure");
        form.row("Amplitude", 'a', amplitude, "Amplitude of the drive");
        JPanel radios = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 0, 0));
        radios.setOpaque(false);
        radios.add(oneSpeed);
        radios.add(speedRange);
        form.row("Speed", (char) 0, radios, "One fixed speed, or a variable-speed drive's range");
        form.row("Shaft speed", 's', speed, "The one speed");
        form.row("Lowest speed", 'l', low, "Bottom of the speed range");
        form.row("Highest speed (same unit)", 'h', high, "Top of the speed range, in the unit of the lowest speed");
        form.row("Harmonic order", 'o', order, "Forcing cycles per revolution");
        form.heading("Derived");
        form.derived("Forcing frequency", derivedBand);
        form.derived("Over the structure's natural frequency", derivedRatio);
        form.end();
        page = new JScrollPane(form);
        ((JScrollPane) page).setBorder(null);
        own("disturbance.amplitude", amplitude);
        own("disturbance.frequency", speed);
        own("disturbance.band", low);
        own("disturbance.band.high", high);
        own("disturbance.frequency_high", high);
        own("disturbance.harmonic_order", order);
        own("disturbance", amplitude);
        kind.addActionListener(e -> {
            amplitude.setUnits(units(kindOf(kind.getSelectedIndex())));
            edited("disturbance.kind");
        });
        oneSpeed.addActionListener(e -> {
            enableSpeeds();
            edited("disturbance.speed");
        });
        speedRange.addActionListener(e -> {
            enableSpeeds();
            edited("disturbance.speed");
        });
        for (QuantityField f : List.of(amplitude, speed, low, high, order)) {
            f.onChange(() -> edited(f.fieldId()));
        }
        enableSpeeds();
        convertOnChange();
    }

    /**
     * The highest speed is typed in the lowest speed's unit, so it follows when that unit changes.
     * A force, an unbalance and a base motion are different quantities: a change of kind brings
     * back the amplitude last typed for that kind, or empties the field and says what to type
     * (a force and a broadband force share theirs). Attached after the other listeners.
     */
    private void convertOnChange() {
        low.onUnitChange((from, to) -> high.scale(from.toSi(1) / to.toSi(1)));
        FormSwitch.attach(kind, amplitude, i -> units(kindOf(i)),
                (from, to, v) -> kindOf(from) == kindOf(to) ? v : Double.NaN,
                i -> "type the " + switch (kindOf(i)) {
                    case FORCE -> "force amplitude";
                    case UNBALANCE -> "unbalance m\u00b7e";
                    default -> "amplitude of the base motion";
                });
    }

    private void edited(String key) {
        commit(() -> ProjectEdits.disturbance(key, input()));
    }

    @Override
    void showProject(Project p, boolean loaded) {
        boolean variance = p.absorber().method() == DesignMethod.EXACT_VARIANCE
                || p.absorber().method() == DesignMethod.MINIMUM_VARIANCE;
        load(p.disturbance(), loaded && variance && p.disturbance().kind() == ExcitationKind.FORCE);
    }

    @Override
    boolean fieldsValid() {
        boolean ok = check(amplitude) & check(order);
        if (speedRange.isSelected()) {
            ok &= check(low) & check(high);
        } else {
            ok &= check(speed);
        }
        return ok;
    }

    private void enableSpeeds() {
        boolean range = speedRange.isSelected();
        speed.textField().setEnabled(!range);
        low.textField().setEnabled(range);
        high.textField().setEnabled(range);
    }

    @Override
    String title() {
        return "Disturbance";
    }

    @Override
    JComponent component() {
        return page;
    }

    /** @return true when a broadband (white-noise) force is chosen */
    boolean broadband() {
        return kind.getSelectedIndex() == BROADBAND;
    }

    DisturbanceInput input() {
        ExcitationKind k = kindOf(kind.getSelectedIndex());
        QuantityInput a = amplitude.input();
        double h = order.number();
        if (speedRange.isSelected()) {
            return new DisturbanceInput(k, a, null, low.number(), high.number(), low.unit(), h);
        }
        return new DisturbanceInput(k, a, speed.input(), Double.NaN, Double.NaN, null, h);
    }

    /**
     * @param d the disturbance
     * @param broadband true to show a force as broadband (a file says so through its variance method)
     */
    private void load(DisturbanceInput d, boolean broadband) {
        // A broadband force is a force in the file: keep the broadband choice unless the kind changed.
        if (broadband || kindOf(kind.getSelectedIndex()) != d.kind()) {
            select(kind, broadband ? BROADBAND : d.kind().ordinal());
        }
        showValue(amplitude, d.amplitude());
        if (d.isBand()) {
            speedRange.setSelected(true);
            showValue(low, d.bandLow(), d.bandUnit());
            showValue(high, d.bandHigh(), null);
            if (speed.textField().getText().isBlank()) {
                speed.show(d.bandLow(), d.bandUnit()); // a start for switching to one speed
            }
        } else {
            oneSpeed.setSelected(true);
            showValue(speed, d.frequency());
            if (low.textField().getText().isBlank() || high.textField().getText().isBlank()) {
                low.show(d.frequency().value(), d.frequency().unit()); // a start for switching to a range
                high.show(d.frequency().value(), null);
            }
        }
        showValue(order, d.harmonicOrder(), Unit.RATIO);
        enableSpeeds();
    }

    void showDerived(Excitation e, Structure s) {
        if (e == null) {
            derivedBand.setText("\u2014");
            derivedRatio.setText("\u2014");
            return;
        }
        double lo = Unit.HERTZ.fromSi(e.band().low());
        double hi = Unit.HERTZ.fromSi(e.band().high());
        derivedBand.setText(e.band().isSingle() ? QuantityFormat.number(lo, 4) + " Hz"
                : QuantityFormat.number(lo, 4) + " to " + QuantityFormat.number(hi, 4) + " Hz");
        if (s != null) {
            double w = s.naturalFrequency();
            derivedRatio.setText(e.band().isSingle() ? QuantityFormat.number(e.band().low() / w, 4)
                    : QuantityFormat.number(e.band().low() / w, 4) + " to " + QuantityFormat.number(e.band().high() / w, 4));
        }
    }

    static ExcitationKind kindOf(int index) {
        return index == BROADBAND ? ExcitationKind.FORCE : ExcitationKind.values()[index];
    }

    private static List<Unit> units(ExcitationKind k) {
        return UnitChoices.of(k.amplitudeDimension());
    }
}
