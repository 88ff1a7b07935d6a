def log = new File(basedir, 'build.log').text
def finding = "[ERROR] programmes/misspelt.yaml:16:23: error unknown-exercise: unknown exercise 'barbel-bench-press'"
// Both builds fail with the same finding; the second replayed the first build's outcome instead of checking again.
assert log.count(finding) == 2
assert log.count('mesolint: 2 files checked: 1 error') == 2
assert log.count('mesolint: 2 programmes unchanged, results reused from cache (nothing changed since the last build)') == 1
assert log.indexOf('results reused from cache') > log.indexOf(finding)
assert log.count('BUILD FAILURE') == 2

// The second build loaded the plugin, but no YAML parser, schema validator or rule class.
def classes = new File(basedir, 'classes.log').readLines()
assert classes.any { it.contains(' dev.mesolint.maven.CheckMojo ') } : 'the class log covers the plugin'
def forbidden = ['org.yaml.snakeyaml.', 'com.networknt.', 'dev.mesolint.core.rules.', 'dev.mesolint.core.rule.',
                 'dev.mesolint.core.yaml.', 'dev.mesolint.core.format.', 'dev.mesolint.core.model.']
def loaded = classes.findAll { line -> forbidden.any { line.contains(' ' + it) } }
assert loaded.isEmpty() : "loaded on an unchanged build: ${loaded.take(20).join('\n')}"
return true
