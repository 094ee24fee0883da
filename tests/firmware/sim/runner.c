/*
 * Mixwright's firmware test runner on libsimavr.
 *
 *   runner <mcu> <frequency> <firmware.elf> < script
 *
 * The script is one event per line (cycle counts are simulated CPU cycles):
 *   limit <cycle>                stop at this cycle (required)
 *   regs <addr> [<addr> ...]     data-space addresses (hex) to read at each dump
 *   mark <addr>                  record every write to this I/O address; value 0xFF stops the run
 *   uart <cycle> <hex bytes>     push bytes into UART0's receiver at this cycle
 *   pin <port> <bit> <cycle> <0|1>  drive an input pin (port letter A..L)
 *   dump <cycle> <tag>           read the `regs` addresses at this cycle
 *   watch <port> <bit>           record every level change of this pin (outputs included)
 *
 * It prints one JSON object: the cycle reached, why it stopped, everything UART0 sent
 * (hex), the marks as [cycle, value] pairs, the watched edges as [cycle, pin, level] (pin =
 * port letter code * 8 + bit) and the dumps.
 */
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>
#include <stdint.h>
#include <simavr/sim_avr.h>
#include <simavr/sim_elf.h>
#include <simavr/sim_io.h>
#include <simavr/avr_uart.h>
#include <simavr/avr_ioport.h>

#define MAX_REGS 64

enum kind { EV_UART, EV_PIN, EV_DUMP };

struct event {
	enum kind kind;
	unsigned long long cycle;
	unsigned char bytes[64];
	int length;        /* UART byte count */
	char port;
	int bit, level;
	char tag[64];
};

static struct event *events;
static int event_count;
static size_t event_capacity;
static unsigned regs[MAX_REGS];
static int reg_count;
static unsigned char *uart_out;
static size_t uart_len, uart_cap;
static unsigned long long (*marks)[2];
static size_t mark_count, mark_cap;
static unsigned long long (*edges)[3];
static size_t edge_count, edge_cap;
static int stop_requested;
static avr_t *avr;
static FILE *json; /* the original standard output; libsimavr's own messages go to stderr */

static void *grow(void *buffer, size_t *capacity, size_t needed, size_t item) {
	if (needed <= *capacity) return buffer;
	*capacity = needed * 2 + 16;
	buffer = realloc(buffer, *capacity * item);
	if (!buffer) { fprintf(stderr, "out of memory\n"); exit(3); }
	return buffer;
}

static void on_uart_output(struct avr_irq_t *irq, uint32_t value, void *param) {
	(void)irq; (void)param;
	uart_out = grow(uart_out, &uart_cap, uart_len + 1, 1);
	uart_out[uart_len++] = (unsigned char)value;
}

static void on_mark_write(struct avr_t *core, avr_io_addr_t addr, uint8_t value, void *param) {
	(void)param;
	core->data[addr] = value;
	marks = grow(marks, &mark_cap, mark_count + 1, sizeof *marks);
	marks[mark_count][0] = core->cycle;
	marks[mark_count][1] = value;
	mark_count++;
	if (value == 0xFF) stop_requested = 1;
}

static void on_pin_change(struct avr_irq_t *irq, uint32_t value, void *param) {
	(void)irq;
	edges = grow(edges, &edge_cap, edge_count + 1, sizeof *edges);
	edges[edge_count][0] = avr->cycle;
	edges[edge_count][1] = (unsigned long long)(uintptr_t)param;
	edges[edge_count][2] = value;
	edge_count++;
}

static void watch_pin(char port, int bit) {
	avr_irq_t *pin = avr_io_getirq(avr, AVR_IOCTL_IOPORT_GETIRQ(port), bit);
	if (!pin) {
		fprintf(stderr, "no pin %c%d on this chip\n", port, bit);
		exit(2);
	}
	avr_irq_register_notify(pin, on_pin_change, (void *)(uintptr_t)(port * 8 + bit));
}

static struct event *new_event(void) {
	events = grow(events, &event_capacity, (size_t)event_count + 1, sizeof *events);
	memset(&events[event_count], 0, sizeof *events);
	return &events[event_count++];
}

static int by_cycle(const void *a, const void *b) {
	const struct event *x = a, *y = b;
	if (x->cycle != y->cycle) return x->cycle < y->cycle ? -1 : 1;
	return 0;
}

static unsigned long long read_script(FILE *in, unsigned *mark_addr) {
	char line[1024];
	unsigned long long limit = 0;
	while (fgets(line, sizeof line, in)) {
		char word[16];
		int used = 0;
		if (sscanf(line, "%15s %n", word, &used) < 1) continue;
		char *rest = line + used;
		if (!strcmp(word, "limit")) {
			limit = strtoull(rest, NULL, 10);
		} else if (!strcmp(word, "regs")) {
			char *p = rest, *end;
			for (unsigned long v = strtoul(p, &end, 16); end != p && reg_count < MAX_REGS; v = strtoul(p, &end, 16)) {
				regs[reg_count++] = (unsigned)v;
				p = end;
			}
		} else if (!strcmp(word, "mark")) {
			*mark_addr = (unsigned)strtoul(rest, NULL, 16);
		} else if (!strcmp(word, "uart")) {
			struct event *e = new_event();
			char *p = rest, *end;
			e->kind = EV_UART;
			e->cycle = strtoull(p, &end, 10);
			p = end;
			for (unsigned long v = strtoul(p, &end, 16); end != p && e->length < 64; v = strtoul(p, &end, 16)) {
				e->bytes[e->length++] = (unsigned char)v;
				p = end;
			}
		} else if (!strcmp(word, "pin")) {
			struct event *e = new_event();
			e->kind = EV_PIN;
			if (sscanf(rest, " %c %d %llu %d", &e->port, &e->bit, &e->cycle, &e->level) != 4) {
				fprintf(stderr, "bad pin line: %s", line);
				exit(2);
			}
		} else if (!strcmp(word, "watch")) {
			char port;
			int bit;
			if (sscanf(rest, " %c %d", &port, &bit) != 2) {
				fprintf(stderr, "bad watch line: %s", line);
				exit(2);
			}
			watch_pin(port, bit);
		} else if (!strcmp(word, "dump")) {
			struct event *e = new_event();
			e->kind = EV_DUMP;
			if (sscanf(rest, "%llu %63s", &e->cycle, e->tag) != 2) {
				fprintf(stderr, "bad dump line: %s", line);
				exit(2);
			}
		} else {
			fprintf(stderr, "unknown script word: %s\n", word);
			exit(2);
		}
	}
	qsort(events, (size_t)event_count, sizeof *events, by_cycle);
	return limit;
}

static void print_dump(const struct event *e, int *first) {
	fprintf(json, "%s{\"tag\":\"%s\",\"cycle\":%llu,\"regs\":{", *first ? "" : ",", e->tag, (unsigned long long)avr->cycle);
	for (int i = 0; i < reg_count; i++) fprintf(json, "%s\"%u\":%u", i ? "," : "", regs[i], avr->data[regs[i]]);
	fprintf(json, "}}");
	*first = 0;
}

static void apply(const struct event *e, int *first_dump) {
	if (e->kind == EV_UART) {
		avr_irq_t *input = avr_io_getirq(avr, AVR_IOCTL_UART_GETIRQ('0'), UART_IRQ_INPUT);
		for (int i = 0; i < e->length; i++) avr_raise_irq(input, e->bytes[i]);
	} else if (e->kind == EV_PIN) {
		avr_irq_t *pin = avr_io_getirq(avr, AVR_IOCTL_IOPORT_GETIRQ(e->port), e->bit);
		if (!pin) {
			fprintf(stderr, "no pin %c%d on this chip\n", e->port, e->bit);
			exit(2);
		}
		avr_raise_irq(pin, (uint32_t)e->level);
	} else {
		print_dump(e, first_dump);
	}
}

int main(int argc, char **argv) {
	if (argc != 4) {
		fprintf(stderr, "usage: runner <mcu> <frequency> <firmware.elf> < script\n");
		return 2;
	}
	json = fdopen(dup(1), "w");
	dup2(2, 1);
	elf_firmware_t firmware;
	memset(&firmware, 0, sizeof firmware);
	if (elf_read_firmware(argv[3], &firmware)) {
		fprintf(stderr, "cannot read %s\n", argv[3]);
		return 2;
	}
	avr = avr_make_mcu_by_name(argv[1]);
	if (!avr) {
		fprintf(stderr, "unknown mcu %s\n", argv[1]);
		return 2;
	}
	avr_init(avr);
	avr_load_firmware(avr, &firmware);
	avr->frequency = (uint32_t)strtoul(argv[2], NULL, 10);
	avr->log = LOG_ERROR;

	unsigned mark_addr = 0;
	unsigned long long limit = read_script(stdin, &mark_addr);
	if (!limit) {
		fprintf(stderr, "the script needs a limit line\n");
		return 2;
	}
	/* Raw bytes, no console echo, no host sleeping while the firmware polls the receiver. */
	uint32_t flags = 0;
	avr_ioctl(avr, AVR_IOCTL_UART_SET_FLAGS('0'), &flags);
	avr_irq_register_notify(avr_io_getirq(avr, AVR_IOCTL_UART_GETIRQ('0'), UART_IRQ_OUTPUT), on_uart_output, NULL);
	if (mark_addr) avr_register_io_write(avr, (avr_io_addr_t)mark_addr, on_mark_write, NULL);

	fprintf(json, "{\"dumps\":[");
	int first_dump = 1, next = 0, state = cpu_Running;
	const char *reason = "limit";
	while (avr->cycle < limit) {
		while (next < event_count && events[next].cycle <= avr->cycle) apply(&events[next++], &first_dump);
		state = avr_run(avr);
		if (state == cpu_Done || state == cpu_Crashed) {
			reason = state == cpu_Done ? "done" : "crashed";
			break;
		}
		if (stop_requested) {
			reason = "marker";
			break;
		}
	}
	fprintf(json, "],\"cycles\":%llu,\"reason\":\"%s\",\"uart\":\"", (unsigned long long)avr->cycle, reason);
	for (size_t i = 0; i < uart_len; i++) fprintf(json, "%02x", uart_out[i]);
	fprintf(json, "\",\"marks\":[");
	for (size_t i = 0; i < mark_count; i++) fprintf(json, "%s[%llu,%llu]", i ? "," : "", marks[i][0], marks[i][1]);
	fprintf(json, "],\"edges\":[");
	for (size_t i = 0; i < edge_count; i++) fprintf(json, "%s[%llu,%llu,%llu]", i ? "," : "", edges[i][0], edges[i][1], edges[i][2]);
	fprintf(json, "]}\n");
	return 0;
}
