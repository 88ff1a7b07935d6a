package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class TextsTests {
    @Test
    void theArticleFollowsTheNumberAsItIsSaid() {
        // English: "an" before a vowel sound, so before eight, eighteen, eighty and eleven (common practice)
        assertEquals("a", Texts.article("7"));
        assertEquals("an", Texts.article("8"));
        assertEquals("an", Texts.article("80"));
        assertEquals("an", Texts.article("11"));
        assertEquals("an", Texts.article("18"));
        assertEquals("an", Texts.article("11.5"));
        assertEquals("an", Texts.article("18.25"));
        assertEquals("a", Texts.article("1"));
        assertEquals("a", Texts.article("110"));
        assertEquals("a", Texts.article("12"));
        assertEquals("a", Texts.article("11."));
        assertEquals("a", Texts.article("11.x"));
        assertEquals("an 11-rep effort", Texts.effort(11.04));
        assertEquals("a 12.5-rep effort", Texts.effort(12.5));
    }
}
