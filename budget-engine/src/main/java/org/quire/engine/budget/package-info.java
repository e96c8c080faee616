/** Input quantities, their evaluations (Type A and Type B), distributions and correlations. */
package org.quire.engine.budget;
