/** The measurement-model language: lexer, parser, diagnostics and the compiled model. */
package org.quire.engine.model;
