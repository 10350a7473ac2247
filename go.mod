module github.com/gyprisk/gyprisk

go 1.26.8

require github.com/spf13/pflag v1.1.0

require (
	github.com/BurntSushi/toml v1.6.0 // indirect
	github.com/jung-kurt/gofpdf v1.16.2 // indirect
	golang.org/x/image v0.48.0 // indirect
	gonum.org/v1/gonum v0.17.0 // indirect
)
