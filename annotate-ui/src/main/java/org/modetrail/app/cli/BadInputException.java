package org.modetrail.app.cli;

/** Input the user must correct; the message says what is wrong, where, and what to do. */
public class BadInputException extends Exception {
    public BadInputException(String message) {
        super(message);
    }

    public BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
