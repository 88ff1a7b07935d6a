def log = new File(basedir, 'build.log').text
def finding = "[ERROR] programmes/misspelt.yaml:16:23: error unknown-exercise: unknown exercise 'barbel-bench-press'"
// Both builds fail with the same finding; the second reused both results instead of checking again.
assert log.count(finding) == 2
assert log.count('mesolint: 2 files checked: 1 error') == 2
assert log.count('mesolint: 2 programmes unchanged, results reused from cache') == 1
assert log.indexOf('results reused from cache') > log.indexOf(finding)
assert log.count('BUILD FAILURE') == 2
return true
