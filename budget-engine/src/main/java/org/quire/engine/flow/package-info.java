/** Flow-metrology functions: water and air density, buoyancy, thermal expansion, meter relations. */
package org.quire.engine.flow;
