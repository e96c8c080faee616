/**
 * Quire's computation library: measurement models, input quantities, the GUM evaluation, the Monte Carlo
 * method, calibration lines, units and budget documents. It depends only on {@code java.base}, JSON-P, Commons CSV and
 * its numeric libraries; the compiler refuses any import of a user-interface toolkit here.
 */
module org.quire.engine {
    requires transitive jakarta.json;
    requires transitive commons.math3;
    requires transitive org.apache.commons.rng.api;
    requires org.apache.commons.rng.simple;
    requires org.apache.commons.rng.sampling;
    requires org.apache.commons.csv;

    exports org.quire.engine.model;
    exports org.quire.engine.budget;
    exports org.quire.engine.gum;
    exports org.quire.engine.montecarlo;
    exports org.quire.engine.units;
    exports org.quire.engine.flow;
    exports org.quire.engine.line;
    exports org.quire.engine.conformity;
    exports org.quire.engine.document;
    exports org.quire.engine.validate;
    exports org.quire.engine.io;
    exports org.quire.engine.reference;
    exports org.quire.engine.csv;
    exports org.quire.engine.calibration;
}
