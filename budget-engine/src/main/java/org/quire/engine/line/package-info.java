/**
 * Straight-line calibration and the use of a calibration line.
 *
 * <p>A flow meter calibrated at several flow points gives pairs (x, y): the reference flow and the meter's
 * indication (electrode voltage, pulse frequency or indicated flow). {@link org.quire.engine.line.LineFitter}
 * fits y = a + b (x - x0) to a {@link org.quire.engine.line.CalibrationData} set by one of the
 * {@link org.quire.engine.line.LineMethod}s; the slope b is the meter's calibration constant. The resulting
 * {@link org.quire.engine.line.LineFit} gives u(a), u(b), cov(a, b), residuals and the chi-squared check, and
 * is used forwards ({@link org.quire.engine.line.LineFit#valueAt}) and backwards, to turn a new indication
 * into a flow ({@link org.quire.engine.line.LineFit#inverse(double, double, double)}).
 * {@link org.quire.engine.csv.CalibrationCsv} reads data sets from CSV text through the one CSV reader.
 *
 * <p>All types are immutable and thread-safe.
 *
 * <p>References: ISO/TS 28037:2010, Determination and use of straight-line calibration functions (clauses 6
 * to 8); JCGM 100:2008 (GUM) H.3.
 */
package org.quire.engine.line;
