package dev.mesolint.core.value;

/** Unit of an absolute load. */
public enum LoadUnit {
    KG("kg", 1.0),
    LB("lb", 0.45359237);

    private final String symbol;
    private final double kilograms;

    LoadUnit(String symbol, double kilograms) {
        this.symbol = symbol;
        this.kilograms = kilograms;
    }

    public String symbol() {
        return symbol;
    }

    /** Converts an amount in this unit to the other unit. */
    public double convert(double amount, LoadUnit to) {
        return amount * kilograms / to.kilograms;
    }

    public static LoadUnit fromSymbol(String symbol) {
        for (LoadUnit u : values()) {
            if (u.symbol.equalsIgnoreCase(symbol)) {
                return u;
            }
        }
        throw new IllegalArgumentException("unknown unit " + symbol);
    }
}
