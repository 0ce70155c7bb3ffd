package org.shearstack.geom;

import java.util.Arrays;

/** A growable int array. */
final class IntList {

    private int[] data;
    private int size;

    IntList(int capacity) {
        data = new int[Math.max(4, capacity)];
    }

    void add(int a, int b, int c) {
        if (size + 3 > data.length) {
            data = Arrays.copyOf(data, data.length * 2);
        }
        data[size++] = a;
        data[size++] = b;
        data[size++] = c;
    }

    int size() {
        return size;
    }

    int[] toArray() {
        return Arrays.copyOf(data, size);
    }
}
