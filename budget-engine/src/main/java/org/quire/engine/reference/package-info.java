/**
 * The laboratory's register of reference standards (balances, weights, thermometers, master meters and the like),
 * each with the certificate that makes it traceable and the date its calibration falls due, and the check that a
 * calibration on a given date uses only references whose calibration was valid on that date.
 *
 * <p>References: ISO/IEC 17025:2017 6.4.13 (records of equipment: calibration dates, results, due date) and 6.5
 * (metrological traceability); ILAC P10:2020 (traceability through accredited calibration); EA-4/02 M:2022 5
 * (the certificate states the traceability of the result).
 */
package org.quire.engine.reference;
