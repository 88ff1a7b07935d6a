package dev.mesolint.core.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class TextsTests {
    @Test
    void theArticleFollowsTheNumberAsItIsSaid() {
        // English: "an" before a vowel sound, so before eight, eighteen, eighty and eleven (common practice)
        String[][] said = {{"7", "a"}, {"8", "an"}, {"80", "an"}, {"11", "an"}, {"18", "an"}, {"11.5", "an"},
            {"18.25", "an"}, {"1", "a"}, {"110", "a"}, {"12", "a"}, {"11.", "a"}, {"11.x", "a"}};
        for (String[] number : said) {
            assertEquals(number[1], Texts.article(number[0]), number[0]);
        }
        assertEquals("an 11-rep effort", Texts.effort(11.04));
        assertEquals("a 12.5-rep effort", Texts.effort(12.5));
    }
}
