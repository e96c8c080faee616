/** Published worked examples and the runner that checks Quire against them. */
package org.quire.engine.validate;
