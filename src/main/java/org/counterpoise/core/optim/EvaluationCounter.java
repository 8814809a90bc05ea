package org.counterpoise.core.optim;

/** Transfer functions built during one optimisation (the cost measure of {@link PeakOptimum}). */
final class EvaluationCounter {
    private int count;

    void add(int n) {
        count += n;
    }

    int count() {
        return count;
    }
}
