package org.counterpoise.io.project;

import org.counterpoise.core.model.BalanceGrade;

/**
 * A rotor's unbalance as the user may know it instead of in g*mm: its balance quality grade, its
 * mass and its maximum service speed (ISO 21940-11, see {@link BalanceGrade}), as typed.
 *
 * @param grade the grade G as a velocity (G 6.3 is 6.3 mm/s)
 * @param rotorMass the rotor's mass
 * @param maxSpeed the rotor's maximum service speed (a shaft speed: rpm, Hz, rad/s)
 */
public record BalanceGradeInput(QuantityInput grade, QuantityInput rotorMass, QuantityInput maxSpeed) {

    /** The keys of the three entries in a {@code balance_grade} object: the one list of them. */
    static final String GRADE = "grade";
    /** Key of {@link #rotorMass}. */
    static final String ROTOR_MASS = "rotor_mass";
    /** Key of {@link #maxSpeed}. */
    static final String MAX_SPEED = "max_speed";

    /**
     * @param path the field's path in the file, e.g. {@code disturbance.balance_grade}
     * @return the grade in SI, checked (messages name {@code path.grade.value} and so on)
     */
    public BalanceGrade toCore(String path) {
        return new BalanceGrade(grade.positiveSi(path + "." + GRADE + ".value"),
                rotorMass.positiveSi(path + "." + ROTOR_MASS + ".value"),
                maxSpeed.positiveSi(path + "." + MAX_SPEED + ".value"));
    }
}
