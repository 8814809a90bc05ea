package org.counterpoise;
public final class Main { public static void main(String[] a) { } }
