/** Budget documents: metadata, revisions, safe saving, templates. */
package org.quire.engine.document;
