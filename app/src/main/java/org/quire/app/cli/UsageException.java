package org.quire.app.cli;

/**
 * A command line that cannot be carried out as written: exit status {@link CommandLine#USER_ERROR} with the
 * message, no stack trace.
 */
final class UsageException extends Exception {
    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
