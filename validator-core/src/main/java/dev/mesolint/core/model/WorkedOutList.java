package dev.mesolint.core.model;

import java.util.AbstractList;
import java.util.List;
import java.util.RandomAccess;
import java.util.function.Supplier;

/**
 * An unmodifiable list worked out the first time it is read, then kept: for figures only some runs read (the
 * per-lift strength figures: the {@code strength} profile's rule and the reports), from inputs that never change.
 * To every reader (equals, hashCode, iteration) it is the list its supplier makes. Thread-safe.
 */
final class WorkedOutList<E> extends AbstractList<E> implements RandomAccess {
    private Supplier<List<E>> make;
    private volatile List<E> list;

    WorkedOutList(Supplier<List<E>> make) {
        this.make = make;
    }

    /** {@code list} kept as it is when it is a worked-out list (not read yet), else copied unmodifiable. */
    static <E> List<E> keep(List<E> list) {
        return list instanceof WorkedOutList<E> ? list : List.copyOf(list);
    }

    private List<E> list() {
        List<E> made = list;
        if (made == null) {
            synchronized (this) {
                made = list;
                if (made == null) {
                    made = List.copyOf(make.get());
                    list = made;
                    make = null;
                }
            }
        }
        return made;
    }

    @Override
    public E get(int index) {
        return list().get(index);
    }

    @Override
    public int size() {
        return list().size();
    }
}
