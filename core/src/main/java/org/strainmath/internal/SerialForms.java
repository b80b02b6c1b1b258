package org.strainmath.internal;

import java.io.InvalidObjectException;
import java.util.function.Supplier;

/**
 * Helpers of the serial forms of strainmath's configuration objects. Each serializable class
 * writes, through {@code writeReplace}, a small nested {@code Serial} object that holds only its
 * defining values, and that object rebuilds the class on reading through the same checks as
 * its factories (the serialization-proxy pattern; Bloch, <i>Effective Java</i>, 3rd ed.,
 * item 90). A stream that names the class itself, or holds values a factory refuses, is
 * rejected with {@link InvalidObjectException}.
 *
 * <p>Stateless; thread-safe.
 */
public final class SerialForms {

    private SerialForms() {
    }

    /**
     * The object {@code build} makes from a serial form's values.
     *
     * @throws InvalidObjectException if {@code build} refuses them (an
     *                                {@link IllegalArgumentException}, a
     *                                {@link NullPointerException} or an
     *                                {@link ArithmeticException} of a factory)
     */
    public static Object rebuild(String type, Supplier<?> build) throws InvalidObjectException {
        try {
            return build.get();
        } catch (IllegalArgumentException | NullPointerException | ArithmeticException
                | IndexOutOfBoundsException e) {
            InvalidObjectException invalid = new InvalidObjectException(
                    "serial form of " + type + " must hold valid values: " + e.getMessage());
            invalid.initCause(e);
            throw invalid;
        }
    }

    /** The exception for a stream that names a serializable class instead of its serial form. */
    public static InvalidObjectException proxyRequired(String type) {
        return new InvalidObjectException(type + " must be read through its serial form");
    }
}
