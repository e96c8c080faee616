/** Units of measurement, dimensions and exact conversion factors. */
package org.quire.engine.units;
