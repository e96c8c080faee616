/** Maximum permissible errors and conformity decisions (JCGM 106, ILAC G8). */
package org.quire.engine.conformity;
