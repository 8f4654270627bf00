package org.convgrid.output;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

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
