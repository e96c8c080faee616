/**
 * Maximum permissible errors and conformity decisions.
 *
 * <p>An {@link org.quire.engine.conformity.MpeEnvelope} gives the limits, in % of the reading, over flow zones
 * (and temperature bands); {@link org.quire.engine.conformity.MpeEnvelopes} builds the envelopes of OIML R 49
 * water meters and OIML R 117 measuring systems for other liquids. A
 * {@link org.quire.engine.conformity.DecisionRule} decides for each
 * {@link org.quire.engine.conformity.MeasuredError}, computes the probability of conformity
 * ({@link org.quire.engine.conformity.ConformityProbability}) and states itself and its risk in a sentence for
 * the certificate; {@link org.quire.engine.conformity.ConformityAssessment} does this for a set of points.
 *
 * <p>All types are immutable and thread-safe.
 *
 * <p>References: ISO/IEC 17025:2017 7.8.6; ILAC G8:2019; JCGM 106:2012 clauses 7 to 9; OIML R 49-1:2013 /
 * ISO 4064-1:2014; OIML R 117-1 (the last two read in secondary copies).
 */
package org.quire.engine.conformity;
