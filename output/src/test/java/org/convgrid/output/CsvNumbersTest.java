package org.convgrid.output;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class CsvNumbersTest {

    @Test
    void plainInsideTheMiddleRangeExponentOutside() {
        assertThat(CsvNumbers.format(1.0)).isEqualTo("1.0");
        assertThat(CsvNumbers.format(0.35)).isEqualTo("0.35");
        assertThat(CsvNumbers.format(-2.5)).isEqualTo("-2.5");
        assertThat(CsvNumbers.format(0.0001)).isEqualTo("0.0001");
        assertThat(CsvNumbers.format(0.00012345)).isEqualTo("0.00012345");
        assertThat(CsvNumbers.format(1234567.0)).isEqualTo("1234567.0");
        assertThat(CsvNumbers.format(12345678.0)).isEqualTo("1.234568e+07");
        assertThat(CsvNumbers.format(1.2345678e-5)).isEqualTo("1.234568e-05");
        assertThat(CsvNumbers.format(3.828e33)).isEqualTo("3.828e+33");
        assertThat(CsvNumbers.format(0.1 + 0.2)).isEqualTo("0.3");
        assertThat(CsvNumbers.format(-0.0)).isEqualTo("0.0");
        assertThat(CsvNumbers.format(Double.NaN)).isEmpty();
        assertThat(CsvNumbers.format(1e-300)).isEqualTo("1.0e-300");
    }

    @Test
    void roundTripsToSevenSignificantDigitsWhateverTheLocale() {
        Locale saved = Locale.getDefault();
        SplittableRandom random = new SplittableRandom(42);
        try {
            for (Locale locale : List.of(Locale.ROOT, Locale.GERMANY, new Locale("ar", "EG"))) {
                Locale.setDefault(locale);
                for (int i = 0; i < 2000; i++) {
                    double v = Math.pow(10, random.nextDouble(-20, 35)) * (random.nextBoolean() ? 1 : -1);
                    String text = CsvNumbers.format(v);
                    assertThat(text).matches("-?[0-9]+(\\.[0-9]+)?(e[-+][0-9]{2,3})?");
                    assertThat(CsvNumbers.parse(text)).isCloseTo(v, within(Math.abs(v) * 5.0e-7));
                    assertThat(CsvNumbers.format(CsvNumbers.parse(text))).isEqualTo(text);
                }
            }
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void roundTripFormWritesTheFewestDigitsThatReadBackTheSameDouble() {
        // the layout of format(), the digits a double needs and no more
        assertThat(CsvNumbers.formatRoundTrip(0.1)).isEqualTo("0.1");
        assertThat(CsvNumbers.formatRoundTrip(1.0)).isEqualTo("1.0");
        assertThat(CsvNumbers.formatRoundTrip(1.0e-6)).isEqualTo("1.0e-06");
        assertThat(CsvNumbers.formatRoundTrip(6.957e10)).isEqualTo("6.957e+10");
        assertThat(CsvNumbers.formatRoundTrip(0.1 + 0.2)).isEqualTo("0.30000000000000004");
        assertThat(CsvNumbers.formatRoundTrip(1.0 / 3.0)).isEqualTo("0.3333333333333333");
        // this one needs all 17 digits (as Python's repr, which is shortest, writes it too)
        assertThat(CsvNumbers.formatRoundTrip(-2.0 / 3.0e20)).isEqualTo("-6.6666666666666666e-21");
        assertThat(CsvNumbers.formatRoundTrip(1234567.0)).isEqualTo("1234567.0");
        assertThat(CsvNumbers.formatRoundTrip(-0.0)).isEqualTo("0.0");
        assertThat(CsvNumbers.formatRoundTrip(Double.NaN)).isEmpty();
        // extremes: the smallest subnormal (one digit reads it back: 4.9e-324 is Java's, 5e-324 the shortest) and the
        // largest double
        assertThat(CsvNumbers.formatRoundTrip(Double.MIN_VALUE)).isEqualTo("5.0e-324");
        assertThat(CsvNumbers.formatRoundTrip(Double.MAX_VALUE)).isEqualTo("1.7976931348623157e+308");
        // Java 17's Double.toString gives 2.82879384806159008E17 (18 digits; JDK-4511638): 15 suffice
        assertThat(CsvNumbers.formatRoundTrip(2.82879384806159e17)).isEqualTo("2.82879384806159e+17");
    }

    @Test
    void roundTripFormReadsBackEveryDoubleExactlyAndIsNeverLongerThanJavasOwn() {
        SplittableRandom random = new SplittableRandom(7);
        for (int i = 0; i < 20000; i++) {
            // random bit patterns cover every exponent and subnormals; the profile range is drawn apart
            double v = i % 2 == 0 ? Double.longBitsToDouble(random.nextLong())
                    : Math.pow(10, random.nextDouble(-15, 35)) * (random.nextBoolean() ? 1 : -1);
            if (!Double.isFinite(v)) {
                continue;
            }
            String text = CsvNumbers.formatRoundTrip(v);
            assertThat(text).matches("-?[0-9]+\\.[0-9]+(e[-+][0-9]{2,3})?");
            assertThat(CsvNumbers.parse(text)).as(text).isEqualTo(v == 0.0 ? 0.0 : v);
            assertThat(significantDigits(text)).as(text).isLessThanOrEqualTo(significantDigits(Double.toString(v)));
            // one digit fewer, rounded either way, reads back another double: the text is the shortest
            int digits = significantDigits(text);
            if (digits > 1) {
                for (RoundingMode mode : List.of(RoundingMode.FLOOR, RoundingMode.CEILING)) {
                    double shorter = new BigDecimal(v).round(new MathContext(digits - 1, mode)).doubleValue();
                    assertThat(shorter).as(text).isNotEqualTo(v);
                }
            }
        }
    }

    /** Significant digits of a decimal text, either layout ({@code 1.5e-05}, {@code 1.5E-5}, {@code 0.0015}). */
    private static int significantDigits(String text) {
        String mantissa = text.replace("-", "").split("[eE]")[0].replace(".", "");
        String digits = mantissa.replaceFirst("^0+", "").replaceFirst("0+$", "");
        return Math.max(1, digits.length());
    }

    @Test
    void parsesEmptyAsNotApplicableAndRejectsGarbage() {
        assertThat(CsvNumbers.parse("")).isNaN();
        assertThat(CsvNumbers.parse("1.5e-05")).isEqualTo(1.5e-5);
        assertThatThrownBy(() -> CsvNumbers.parse("NaN")).isInstanceOf(NumberFormatException.class);
        assertThatThrownBy(() -> CsvNumbers.parse("1,5")).isInstanceOf(NumberFormatException.class);
    }

    @Test
    void spansUseFixedPoint() {
        List<Span> zones = List.of(new Span(0.0, 0.082), new Span(0.991, 1.0));
        assertThat(Span.join(zones)).isEqualTo("0-0.082;0.991-1");
        assertThat(Span.parseList("0-0.082;0.991-1")).isEqualTo(zones);
        assertThat(new Span(1.2e-7, 3.0e-5).toString()).isEqualTo("0-0.00003");
        assertThat(Span.parseList("")).isEmpty();
        assertThatThrownBy(() -> Span.parse("0.5")).isInstanceOf(IllegalArgumentException.class);
    }
}
