package org.counterpoise.ui.gui.wizard;

import java.awt.Component;
import java.awt.FlowLayout;
import java.util.List;
import javax.swing.ButtonGroup;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Spectrum;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.SpectralDensityUnit;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.BalanceGradeInput;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.SpectrumInput;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Form;
import org.counterpoise.ui.gui.field.FormSwitch;
import org.counterpoise.ui.gui.field.ItemWords;
import org.counterpoise.ui.gui.field.QuantityField;

/**
 * Step 2: what shakes the structure, and at which speeds. Longer than 400 lines because it is the
 * one view of the disturbance section (kind, spectrum and its PSD units, amplitude or balance grade,
 * speeds, orders) and keeps their interplay in one place; the other orders and the balance grade
 * are forms of their own ({@link OrdersForm}, {@link BalanceGradeForm}).
 */
final class DisturbanceStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Disturbance";
    private static final List<Unit> FREQUENCY = UnitChoices.of(Dimension.FREQUENCY);
    private static final List<Unit> RATIO = UnitChoices.of(Dimension.RATIO);

    private final JComboBox<ExcitationKind> kind = new JComboBox<>(ExcitationKind.values());
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
    private final JRadioButton harmonic = new JRadioButton("harmonic");
    private final JRadioButton broadband = new JRadioButton("broadband (white noise)");
    private final QuantityField psd = new QuantityField("disturbance.spectrum.psd.value",
            "One-sided power spectral density of the force or base acceleration, per hertz", List.of());
    private final JComboBox<SpectralDensityUnit> psdUnit = new JComboBox<>();
    /** The PSD unit the number on screen is in, to convert it when another unit is picked. */
    private SpectralDensityUnit psdShownUnit;
    private boolean fillingPsdUnits;
    /** A harmonic spectrum written out in the file ({"kind": "harmonic"}), kept as it was; else null. */
    private SpectrumInput statedHarmonic;
    private final QuantityField runUp = new QuantityField("disturbance.run_up_rate",
            "How fast the shaft speed changes at start and stop; leave empty when not known",
            UnitChoices.of(Dimension.ANGULAR_ACCELERATION));
    private final BalanceGradeForm balanceGrade;
    private final OrdersForm orders = new OrdersForm(() -> order.siOrNaN());
    private JLabel amplitudeLabel;
    private final JLabel derivedBand = StructureStep.derived("derived.forcing");
    private final JLabel derivedRatio = StructureStep.derived("derived.ratio");
    private final JComponent page;

    /** @param balanceGrade the balance-grade form (made ahead: {@link Part}) */
    DisturbanceStep(BalanceGradeForm balanceGrade) {
        this.balanceGrade = balanceGrade;
        kind.setName("disturbance.kind");
        ItemWords.show(kind, ExcitationKind.class, DisturbanceStep::words);
        oneSpeed.setName("disturbance.oneSpeed");
        speedRange.setName("disturbance.speedRange");
        ButtonGroup g = new ButtonGroup();
        g.add(oneSpeed);
        g.add(speedRange);
        oneSpeed.setSelected(true);
        harmonic.setName("disturbance.spectrum.harmonic");
        broadband.setName("disturbance.spectrum.whiteNoise");
        ButtonGroup spectra = new ButtonGroup();
        spectra.add(harmonic);
        spectra.add(broadband);
        harmonic.setSelected(true);
        psdUnit.setName("disturbance.spectrum.psd.unit");
        psdUnit.setRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value,
                    int index, boolean selected, boolean focus) {
                return super.getListCellRendererComponent(list, value instanceof SpectralDensityUnit u
                        ? QuantityField.pretty(u.symbol()) : "", index, selected, focus);
            }
        });
        psd.add(psdUnit); // the unit list sits beside the number, as in every other field
        fillPsdUnits(ExcitationKind.FORCE);
        Form form = new Form();
        form.heading("The disturbance");
        form.row("Kind", 'k', kind, "What drives the structure");
        JPanel spectrumRadios = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        spectrumRadios.setOpaque(false);
        spectrumRadios.add(harmonic);
        spectrumRadios.add(broadband);
        form.row("Spectrum", (char) 0, spectrumRadios, "Harmonic: a sinusoid at one speed or anywhere in a range."
                + " Broadband: random force or base acceleration of constant spectral density, judged by rms values");
        form.row("PSD level (broadband)", 'p', psd, "Power spectral density of the white noise, one-sided, per hertz");
        balanceGrade.addSourceTo(form);
        amplitudeLabel = form.row("Amplitude", 'a', amplitude, "Amplitude of the drive (with broadband: for the"
                + " harmonic rows)");
        balanceGrade.addGradeTo(form);
        JPanel radios = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        radios.setOpaque(false);
        radios.add(oneSpeed);
        radios.add(speedRange);
        form.row("Speed", (char) 0, radios, "One fixed speed, or a variable-speed drive's range");
        form.row("Shaft speed", 's', speed, "The one speed");
        form.row("Lowest speed", 'l', low, "Bottom of the speed range");
        form.row("Highest speed (same unit)", 'h', high, "Top of the speed range, in the unit of the lowest speed");
        form.row("Harmonic order", 'o', order, "Forcing cycles per revolution");
        form.row("Run-up rate (optional)", 'r', runUp,
                "How fast the shaft speeds up at start and slows at stop; empty when not given");
        form.heading("Other orders of the rotor");
        form.row("Orders at the same time", (char) 0, orders.component(),
                "Other harmonics of the same shaft (twice the speed, blade-pass...) that shake the structure too");
        form.row("Design for", 'f', orders.designOrderList(), "The order the absorber is tuned to: the one you pick,"
                + " or the one that governs the verdict");
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
        own("disturbance.spectrum", psd);
        own("disturbance.run_up_rate", runUp);
        kind.addActionListener(e -> {
            amplitude.setUnits(units(selectedKind()));
            showAmplitudeRows();
            psdFollowsKind();
            edited("disturbance.kind");
        });
        for (JRadioButton b : List.of(harmonic, broadband)) {
            b.addActionListener(e -> {
                enableSpectrum();
                edited("disturbance.spectrum");
            });
        }
        psdUnit.addActionListener(e -> psdUnitPicked());
        oneSpeed.addActionListener(e -> {
            enableSpeeds();
            edited("disturbance.speed");
        });
        speedRange.addActionListener(e -> {
            enableSpeeds();
            edited("disturbance.speed");
        });
        for (QuantityField f : List.of(amplitude, speed, low, high, psd, runUp)) {
            f.onChange(() -> edited(f.fieldId()));
        }
        order.onChange(() -> {
            orders.refreshDesignOrders(); // the list of the order designed for names this one
            edited(order.fieldId());
        });
        balanceGrade.onChange(key -> {
            showAmplitudeRows();
            edited(key);
        });
        orders.onChange(this::edited);
        orders.onNewField(f -> own(f.fieldId(), f));
        own(BalanceGradeForm.PATH, balanceGrade.fields().get(0));
        own(BalanceGradeForm.PATH + ".rotor_mass", balanceGrade.fields().get(1));
        own(BalanceGradeForm.PATH + ".max_speed", balanceGrade.fields().get(2));
        showAmplitudeRows();
        enableSpeeds();
        enableSpectrum();
        convertOnChange();
    }

    /**
     * The highest speed is typed in the lowest speed's unit, so it follows when that unit changes.
     * A force, an unbalance and a base motion are different quantities: a change of kind brings
     * back the amplitude last typed for that kind, or empties the field and says what to type.
     * Attached after the other listeners.
     */
    private void convertOnChange() {
        low.onUnitChange((from, to) -> high.scale(from.toSi(1) / to.toSi(1)));
        FormSwitch.attachItems(kind, amplitude, DisturbanceStep::units, (from, to, v) -> Double.NaN,
                k -> "type the " + switch (k) {
                    case FORCE -> "force amplitude";
                    case UNBALANCE -> "unbalance m\u00b7e";
                    default -> "amplitude of the base motion";
                });
    }

    private void edited(String key) {
        commit(() -> ProjectEdits.disturbance(key, input()));
    }

    /**
     * The PSD units follow the kind (N^2/Hz for a force, (m/s^2)^2/Hz for a base acceleration, none
     * for the others); a level typed for another quantity means nothing now, so it is emptied, and
     * said so while broadband is chosen.
     */
    private void psdFollowsKind() {
        ExcitationKind now = selectedKind();
        SpectralDensityUnit was = (SpectralDensityUnit) psdUnit.getSelectedItem();
        fillPsdUnits(now);
        if (was != null && was.of() != now.amplitudeDimension() && !psd.textField().getText().isBlank()) {
            if (broadband.isSelected()) {
                psd.convertTo(List.of(), Double.NaN, "type the PSD level of the "
                        + (now == ExcitationKind.FORCE ? "force" : "base acceleration"));
            } else {
                psd.clear();
            }
        }
    }

    private void fillPsdUnits(ExcitationKind k) {
        fillingPsdUnits = true;
        try {
            psdUnit.removeAllItems();
            for (SpectralDensityUnit u : SpectralDensityUnit.values()) {
                if (u.of() == k.amplitudeDimension()) {
                    psdUnit.addItem(u);
                }
            }
            psdShownUnit = (SpectralDensityUnit) psdUnit.getSelectedItem();
        } finally {
            fillingPsdUnits = false;
        }
        psdUnit.setVisible(psdUnit.getItemCount() > 0);
    }

    /** Another PSD unit: the number follows, so the spectral density stays what it was. */
    private void psdUnitPicked() {
        if (fillingPsdUnits || syncing()) {
            psdShownUnit = (SpectralDensityUnit) psdUnit.getSelectedItem();
            return;
        }
        SpectralDensityUnit now = (SpectralDensityUnit) psdUnit.getSelectedItem();
        SpectralDensityUnit before = psdShownUnit;
        psdShownUnit = now;
        double v = psd.siOrNaN();
        if (before != null && now != null && before != now && Double.isFinite(v)) {
            psd.show(v * before.toSi(1) / now.toSi(1), null);
        }
        edited("disturbance.spectrum.psd.unit");
    }

    private void enableSpectrum() {
        boolean white = broadband.isSelected();
        psd.textField().setEnabled(white);
        psdUnit.setEnabled(white);
    }

    @Override
    void showProject(Project p, boolean loaded) {
        load(p.disturbance());
    }

    @Override
    boolean fieldsValid() {
        boolean ok = check(order);
        if (gradeGivesAmplitude()) {
            for (QuantityField f : balanceGrade.fields()) {
                ok &= check(f);
            }
        } else {
            ok &= check(amplitude);
        }
        for (QuantityField f : orders.fields()) {
            ok &= check(f);
        }
        if (!runUp.textField().getText().isBlank()) {
            ok &= check(runUp);
        }
        if (broadband.isSelected()) {
            try {
                spectrum();
            } catch (InvalidInputException e) {
                showProblem(e);
                ok = false;
            }
        }
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
        return TITLE;
    }

    @Override
    JComponent component() {
        return page;
    }

    DisturbanceInput input() {
        ExcitationKind k = selectedKind();
        boolean byGrade = gradeGivesAmplitude();
        QuantityInput a = byGrade ? null : amplitude.input();
        BalanceGradeInput g = byGrade ? balanceGrade.input() : null;
        double h = order.number();
        QuantityInput rate = runUp.textField().getText().isBlank() ? null : runUp.input();
        SpectrumInput sp = spectrum();
        if (speedRange.isSelected()) {
            return new DisturbanceInput(k, a, null, low.number(), high.number(), low.unit(), h, rate, sp, g,
                    orders.orders(), orders.designOrder());
        }
        return new DisturbanceInput(k, a, speed.input(), Double.NaN, Double.NaN, null, h, rate, sp, g,
                orders.orders(), orders.designOrder());
    }

    private boolean gradeGivesAmplitude() {
        return selectedKind() == ExcitationKind.UNBALANCE && balanceGrade.usesGrade();
    }

    /** An unbalance may be given by its balance grade: then the grade's rows stand where the amplitude was. */
    private void showAmplitudeRows() {
        balanceGrade.showRows(selectedKind() == ExcitationKind.UNBALANCE);
        Form.showRow(amplitudeLabel, amplitude, !gradeGivesAmplitude());
    }

    /** @return the spectrum as shown: null (harmonic) or white noise of the level typed */
    private SpectrumInput spectrum() {
        if (!broadband.isSelected()) {
            return statedHarmonic;
        }
        SpectralDensityUnit u = (SpectralDensityUnit) psdUnit.getSelectedItem();
        if (u == null) {
            throw new InvalidInputException("disturbance.spectrum", "white noise with a "
                    + selectedKind().label(), "white noise is a force or a base acceleration:"
                    + " choose one of those kinds, or the harmonic spectrum");
        }
        return SpectrumInput.whiteNoise(psd.number(), u);
    }

    /** @param d the disturbance */
    private void load(DisturbanceInput d) {
        selectItem(kind, d.kind());
        SpectrumInput sp = d.spectrum();
        boolean white = sp != null && sp.kind() == Spectrum.Kind.WHITE_NOISE;
        statedHarmonic = white ? null : sp;
        if (white) {
            broadband.setSelected(true);
            if (psdUnit.getSelectedItem() != sp.psdUnit()) {
                psdUnit.setSelectedItem(sp.psdUnit());
            }
            showValue(psd, sp.psdValue(), null);
        } else {
            harmonic.setSelected(true);
        }
        enableSpectrum();
        showValue(runUp, d.runUpRate());
        showValue(amplitude, d.amplitude());
        balanceGrade.show(d.balanceGrade());
        showAmplitudeRows();
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
        orders.show(d.orders(), d.designOrder());
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

    /** @param k a kind of disturbance @return its name in a list */
    static String words(ExcitationKind k) {
        return switch (k) {
            case FORCE -> "force";
            case UNBALANCE -> "rotating unbalance";
            case BASE_DISPLACEMENT -> "base displacement";
            case BASE_ACCELERATION -> "base acceleration";
        };
    }

    private ExcitationKind selectedKind() {
        return (ExcitationKind) kind.getSelectedItem();
    }

    private static List<Unit> units(ExcitationKind k) {
        return UnitChoices.of(k.amplitudeDimension());
    }
}
