/** Straight-line calibration (ISO/TS 28037) and the use of a calibration line. */
package org.quire.engine.line;
