def log = new File(basedir, 'build.log').text
// The finding, located, at error level, with its fix on the next line.
assert log.contains("[ERROR] programmes/block-2/misspelt.yaml:16:23: error unknown-exercise: unknown exercise 'barbel-bench-press'")
assert log.contains('[ERROR]     fix: exercise: barbell-bench-press')
assert log.contains('mesolint: 2 files checked: 1 error, 0 warnings, 0 info, 0 waived -> FAILED (fail level: error)')
// One failure for the findings (BUILD FAILURE), after every finding was logged.
assert log.contains("mesolint: 1 error at or above the fail level 'error' in 1 of 2 files")
assert log.indexOf('misspelt.yaml:16:23') < log.indexOf('Failed to execute goal')
assert log.contains('MojoFailureException')
assert !log.contains('MojoExecutionException')
// The second build, mesolint:report, writes every report and succeeds on the same findings.
assert log.contains('mesolint: reports written to ')
['mesolint.txt', 'mesolint.html', 'mesolint.json', 'mesolint.sarif', 'TEST-mesolint.xml'].each {
    assert new File(basedir, "target/mesolint/$it").length() > 0 : it
}
assert new File(basedir, 'target/mesolint/mesolint.txt').text.contains('block-2/misspelt.yaml:16:23: error unknown-exercise')
assert log.contains('BUILD SUCCESS')
return true
