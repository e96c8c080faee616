/** The Monte Carlo method of propagating distributions (JCGM 101). */
package org.quire.engine.montecarlo;
