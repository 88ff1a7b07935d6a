def log = new File(basedir, 'build.log').text
// A configuration mistake is an execution error (BUILD ERROR), not a rule failure, and it names the parameter.
assert log.contains("mesolint: failOn (mesolint.failOn): must be error, warning or info, not 'fatal'")
assert log.contains('MojoExecutionException')
assert !log.contains('MojoFailureException')
assert !log.contains('files checked')
return true
