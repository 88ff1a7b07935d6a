package dev.mesolint.core.value;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class ValueParsersTests {

    @ParameterizedTest
    @CsvSource({"90s, 90", "2min, 120", "2.5min, 150", "2:30, 150", "0:45, 45", "0s, 0", "45 s, 45", "1:05, 65"})
    void durationsInEveryWrittenForm(String text, double seconds) throws InvalidValueException {
        assertEquals(seconds, Durations.seconds(Durations.parse(text)), 1e-9);
    }

    @Test
    void aBareNumberIsRefusedWithBothReadingsOffered() {
        InvalidValueException e = assertThrows(InvalidValueException.class, () -> Durations.parse("90"));
        assertEquals("'90' has no unit", e.getMessage());
        assertEquals("write 90s or 90min", e.hint());
    }

    @ParameterizedTest
    @ValueSource(strings = {"2:75", "two minutes", "90sec", "-30s", "", "61min"})
    void badDurationsAreRefused(String text) {
        InvalidValueException e = assertThrows(InvalidValueException.class, () -> Durations.parse(text));
        assertFalse(e.hint().isBlank());
    }

    @Test
    void secondsAfterTheColonMustBeUnderSixty() {
        InvalidValueException e = assertThrows(InvalidValueException.class, () -> Durations.parse("2:75"));
        assertTrue(e.getMessage().contains("75 seconds"), e.getMessage());
    }

    @Test
    void durationsFormatForMessages() {
        assertEquals("75 s", Durations.format(Duration.ofSeconds(75)));
        assertEquals("2 min", Durations.format(Duration.ofSeconds(120)));
        assertEquals("2.5 min", Durations.format(Duration.ofSeconds(150)));
    }

    @ParameterizedTest
    @CsvSource({"75%, 0.75", "100%, 1.0", "62.5%, 0.625"})
    void relativeLoads(String text, double fraction) throws InvalidValueException {
        Load.Relative load = assertInstanceOf(Load.Relative.class, Load.parse(text));
        assertEquals(fraction, load.fraction(), 1e-9);
    }

    @Test
    void absoluteLoadsConvertBetweenUnits() throws InvalidValueException {
        Load.Absolute kg = assertInstanceOf(Load.Absolute.class, Load.parse("80kg"));
        Load.Absolute lb = assertInstanceOf(Load.Absolute.class, Load.parse("175lb"));
        assertEquals(LoadUnit.KG, kg.unit());
        // 1 lb = 0.45359237 kg exactly (international avoirdupois pound, 1959 agreement)
        assertEquals(79.3787, lb.in(LoadUnit.KG), 1e-4);
        assertEquals(176.37, kg.in(LoadUnit.LB), 1e-2);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"80|load '80' has no unit", "120%|above 100% of 1RM", "0kg|must be above zero",
        "heavy|is not a load"})
    void badLoadsSayWhy(String text, String expected) {
        InvalidValueException e = assertThrows(InvalidValueException.class, () -> Load.parse(text));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }

    @Test
    void repsAsNumberRangeOrAmrap() throws InvalidValueException {
        assertEquals(RepTarget.exactly(8), RepTarget.parse("8"));
        RepTarget range = RepTarget.parse("8-12");
        assertEquals(8, range.min());
        assertEquals(12, range.max());
        assertEquals(10.0, range.midpoint());
        assertTrue(RepTarget.parse("AMRAP").amrap());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"12-8|from fewer to more reps", "0|between 1 and 100", "8-8|from fewer to more",
        "twelve|is not a rep count", "101|between 1 and 100"})
    void badRepsSayWhy(String text, String expected) {
        InvalidValueException e = assertThrows(InvalidValueException.class, () -> RepTarget.parse(text));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }

    @Test
    void rirValuesAndRanges() throws InvalidValueException {
        assertEquals(RirRange.of(2), RirRange.parse("2"));
        RirRange range = RirRange.parse("1-2");
        assertEquals(1.5, range.midpoint());
        assertEquals(new RirRange(0, 1), range.plus(-1));
        assertEquals(new RirRange(0, 0), RirRange.of(0).plus(-1), "RIR never drops below 0");
        assertThrows(InvalidValueException.class, () -> RirRange.parse("11"));
        assertThrows(InvalidValueException.class, () -> RirRange.parse("2-1"));
        assertThrows(InvalidValueException.class, () -> RirRange.parse("lots"));
    }

    @ParameterizedTest
    // Zourdos et al. 2016, JSCR 30(1):267-275, RIR-based RPE scale: RPE 10 = 0 RIR, 9 = 1, 8 = 2, 7 = 3
    @CsvSource({"10, 0", "9.5, 0.5", "9, 1", "8.5, 1.5", "8, 2", "7, 3", "5, 5"})
    void rpeMapsToRepsInReserve(String rpe, double rir) throws InvalidValueException {
        assertEquals(rir, Rpe.parse(rpe).repsInReserve(), 1e-9);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"4|outside 5..10", "10.5|outside 5..10", "8.3|half point", "hard|not an RPE"})
    void badRpeSaysWhy(String text, String expected) {
        InvalidValueException e = assertThrows(InvalidValueException.class, () -> Rpe.parse(text));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }

    @Test
    void tempoPhasesAndExplosiveLift() throws InvalidValueException {
        Tempo t = Tempo.parse("3-1-1-0");
        assertEquals(5.0, t.secondsPerRep());
        assertEquals(1.0, t.lifting());
        Tempo x = Tempo.parse("2-0-x-0");
        assertTrue(x.explosiveLift());
        assertEquals(2.5, x.secondsPerRep());
        assertEquals("2-0-x-0", x.toString());
        assertThrows(InvalidValueException.class, () -> Tempo.parse("3-1-1"));
        assertThrows(InvalidValueException.class, () -> Tempo.parse("slow"));
    }
}
