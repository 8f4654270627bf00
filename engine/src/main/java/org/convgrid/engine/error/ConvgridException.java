package org.convgrid.engine.error;

import java.util.List;

/** Unchecked failure of the engine, tagged with a kind and the values that caused it. */
public class ConvgridException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final ErrorKind kind;
    private final transient List<Object> parameters;

    public ConvgridException(ErrorKind kind, String message, Object... parameters) {
        super(message);
        this.kind = kind;
        this.parameters = List.of(parameters);
    }

    /** As {@link #ConvgridException(ErrorKind, String, Object...)}, with the failure that caused it. */
    public ConvgridException(ErrorKind kind, String message, Throwable cause) {
        super(message, cause);
        this.kind = kind;
        this.parameters = List.of();
    }

    public ErrorKind kind() {
        return kind;
    }

    public List<Object> parameters() {
        return parameters;
    }

    /** Fails with {@link ErrorKind#OUT_OF_RANGE} unless lower &lt;= value &lt;= upper (NaN fails). */
    public static double requireInRange(String name, double value, double lower, double upper, String unit) {
        if (!(value >= lower && value <= upper)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE,
                    String.format("%s = %s %s is outside [%s, %s]", name, value, unit, lower, upper),
                    name, value, lower, upper);
        }
        return value;
    }
}
