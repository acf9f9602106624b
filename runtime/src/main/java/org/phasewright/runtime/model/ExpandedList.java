package org.phasewright.runtime.model;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.RandomAccess;
import java.util.function.IntFunction;

/**
 * An immutable list whose elements are made on demand, segment by segment. Indexed families of 10^6 elements keep
 * their flat views (states, rates, symmetry images) in this form so that a model costs memory per declaration, not
 * per element. Build one with {@link #builder()}: single elements and generated runs, in order.
 */
public final class ExpandedList<T> extends AbstractList<T> implements RandomAccess {
    private final int[] segmentStarts; // ascending; segment k covers [segmentStarts[k], segmentStarts[k + 1])
    private final List<IntFunction<T>> segments; // each gets the position within its segment
    private final int size;

    private ExpandedList(int[] segmentStarts, List<IntFunction<T>> segments, int size) {
        this.segmentStarts = segmentStarts;
        this.segments = segments;
        this.size = size;
    }

    /** A list of {@code size} elements, element k being {@code element.apply(k)}. */
    public static <T> ExpandedList<T> of(int size, IntFunction<T> element) {
        return ExpandedList.<T>builder().addGenerated(size, element).build();
    }

    public static <T> Builder<T> builder() {
        return new Builder<>();
    }

    @Override
    public T get(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException(index);
        }
        int k = Arrays.binarySearch(segmentStarts, 0, segments.size(), index);
        if (k < 0) {
            k = -k - 2;
        } else {
            while (k + 1 < segments.size() && segmentStarts[k + 1] == index) {
                k++; // skip empty segments that start at the same position
            }
        }
        return segments.get(k).apply(index - segmentStarts[k]);
    }

    @Override
    public int size() {
        return size;
    }

    /** Keeps an {@code ExpandedList} as it is (it is immutable already); copies any other list. */
    public static <T> List<T> immutable(List<T> list) {
        return list instanceof ExpandedList<T> ? list : List.copyOf(list);
    }

    /** Collects single elements and generated runs in order. */
    public static final class Builder<T> {
        private final List<Integer> starts = new ArrayList<>();
        private final List<IntFunction<T>> segments = new ArrayList<>();
        private int size;

        public Builder<T> add(T element) {
            if (element == null) {
                throw new NullPointerException("element");
            }
            return addGenerated(1, k -> element);
        }

        public Builder<T> addGenerated(int count, IntFunction<T> element) {
            if (count < 0) {
                throw new IllegalArgumentException("negative count");
            }
            if (count == 0) {
                return this;
            }
            if (size + (long) count > Integer.MAX_VALUE - 8) {
                throw new IllegalArgumentException("list too long");
            }
            starts.add(size);
            segments.add(element);
            size += count;
            return this;
        }

        public int size() {
            return size;
        }

        public ExpandedList<T> build() {
            int[] s = starts.stream().mapToInt(Integer::intValue).toArray();
            return new ExpandedList<>(s, List.copyOf(segments), size);
        }
    }
}
