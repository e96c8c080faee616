/**
 * The calibration of a meter across its range: the method (a budget template for one run at one flow point,
 * fixed by id, version and content hash), the flow points with their runs as the rig logged them, the
 * declaration of how each input of the method is shared between points, the adjustment of the meter's
 * calibration constant, the laboratory's CMC table and the conformity specification; and its evaluation
 * ({@link org.quire.engine.calibration.CalibrationEvaluator}) into per-run, per-point, adjustment, as-found and
 * as-left results with their covariance, CMC findings and conformity decisions.
 *
 * <p>All value types are immutable and thread-safe.
 *
 * <p>References: JCGM 100:2008 4.2 (Type A evaluation of the repeatability, nu = n - 1) and 5.1, 5.2 (the
 * point budgets); JCGM 102:2011 6.2.1.3 (covariance of the point results); ISO/TS 28037:2010 clause 8
 * (Gauss-Markov line for an adjustment from a fitted slope); ILAC P14:2020 (CMC and the uncertainty stated on a
 * certificate; clause numbers from memory); JCGM 106:2012 and ILAC G8:2019 (decision rules).
 */
package org.quire.engine.calibration;
