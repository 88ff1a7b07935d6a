package dev.mesolint.core.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** Figures worked out on first read: made once, only when read, and to every reader the list itself. */
class WorkedOutListTests {

    @Test
    void theListIsMadeOnceAndOnlyWhenRead() {
        AtomicInteger made = new AtomicInteger();
        List<String> list = new WorkedOutList<>(() -> {
            made.incrementAndGet();
            return List.of("barbell-back-squat", "barbell-bench-press");
        });
        SessionMetrics session = new SessionMetrics(1, "Day 1", Location.START, 60, Map.of(), List.of(), 0,
                new WorkedOutList<>(() -> {
                    made.incrementAndGet();
                    return List.of();
                }));
        assertEquals(0, made.get(), "building the figures reads neither list");
        assertEquals(List.of(), session.lifts());
        IntStream.range(0, 1000).parallel().forEach(i -> assertEquals(2, list.size()));
        assertEquals(2, made.get(), "each list made once, however many threads read it");
        assertEquals(List.of("barbell-back-squat", "barbell-bench-press"), list);
        assertEquals(list, List.of("barbell-back-squat", "barbell-bench-press"));
        assertEquals(List.of("barbell-back-squat", "barbell-bench-press").hashCode(), list.hashCode());
        assertThrows(UnsupportedOperationException.class, () -> list.add("chin-up"));
    }

    @Test
    void aListOfAnotherKindIsCopiedAsBefore() {
        List<String> plain = List.of("a");
        assertSame(plain, WorkedOutList.keep(plain));
        List<String> worked = new WorkedOutList<>(() -> List.of("a"));
        assertSame(worked, WorkedOutList.keep(worked));
    }
}
