package org.quire.engine.montecarlo;

import org.quire.engine.model.BlockEvaluator;

/** Small hand-written models for the tests, standing in for compiled model text. */
final class TestModels {
    private TestModels() {
    }

    /** Y = X1 + X2 + ... + Xn; JCGM 101:2008 9.2.1, eq. (27) for n = 4. */
    static BlockEvaluator additive(int n) {
        return new BlockEvaluator() {
            @Override public int inputCount() { return n; }
            @Override public int outputCount() { return 1; }
            @Override
            public Session newSession(int maxBlock) {
                return (x, m, y) -> {
                    double[] out = y[0];
                    for (int t = 0; t < m; t++) {
                        double s = 0;
                        for (int i = 0; i < n; i++) {
                            s += x[i][t];
                        }
                        out[t] = s;
                    }
                };
            }
        };
    }

    /**
     * JCGM 101:2008 9.3, eq. (30), in mg: inputs m_Rc, delta_m_Rc (mg), rho_a, rho_W, rho_R (kg/m^3);
     * delta_m = (m_Rc + delta_m_Rc)[1 + (rho_a - rho_a0)(1/rho_W - 1/rho_R)] - m_nom, rho_a0 = 1.2 kg/m^3,
     * m_nom = 100 g = 100000 mg.
     */
    static BlockEvaluator massCalibration() {
        return new BlockEvaluator() {
            @Override public int inputCount() { return 5; }
            @Override public int outputCount() { return 1; }
            @Override
            public Session newSession(int maxBlock) {
                return (x, m, y) -> {
                    for (int t = 0; t < m; t++) {
                        double factor = 1.0 + (x[2][t] - 1.2) * (1.0 / x[3][t] - 1.0 / x[4][t]);
                        y[0][t] = (x[0][t] + x[1][t]) * factor - 100000.0;
                    }
                };
            }
        };
    }

    /** Outputs equal to the inputs: Y_i = X_i, for checking the joint distribution drawn. */
    static BlockEvaluator identity(int n) {
        return new BlockEvaluator() {
            @Override public int inputCount() { return n; }
            @Override public int outputCount() { return n; }
            @Override
            public Session newSession(int maxBlock) {
                return (x, m, y) -> {
                    for (int i = 0; i < n; i++) {
                        System.arraycopy(x[i], 0, y[i], 0, m);
                    }
                };
            }
        };
    }

    /** Y1 = sqrt(X1) (NaN for negative X1), Y2 = X1 + X2. */
    static BlockEvaluator squareRootAndSum() {
        return new BlockEvaluator() {
            @Override public int inputCount() { return 2; }
            @Override public int outputCount() { return 2; }
            @Override
            public Session newSession(int maxBlock) {
                return (x, m, y) -> {
                    for (int t = 0; t < m; t++) {
                        y[0][t] = Math.sqrt(x[0][t]);
                        y[1][t] = x[0][t] + x[1][t];
                    }
                };
            }
        };
    }
}
