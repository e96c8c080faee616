/** Reading and writing budget files (JSON). */
package org.quire.engine.io;
