/** The GUM evaluation (JCGM 100 clause 5 and annex G; JCGM 102 for several outputs). */
package org.quire.engine.gum;
