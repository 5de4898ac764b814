-- End-to-end check of `overfact lsp` with Neovim's built-in LSP client.
-- Written against the Neovim 0.7 API (vim.lsp.start_client,
-- vim.lsp.buf_attach_client, vim.lsp.buf_request_sync,
-- vim.lsp.util.apply_workspace_edit with an offset encoding), which later
-- releases still provide.
--
-- Run as: nvim --headless --clean -u NONE -c "luafile e2e.lua"
-- with these environment variables:
--   OVERFACT_E2E_CMD    the server command, words separated by spaces
--   OVERFACT_E2E_FILE   the Go file to open
--   OVERFACT_E2E_CODE   the code (category) of the diagnostic to fix
--   OVERFACT_E2E_AT     text that diagnostic must start at
--   OVERFACT_E2E_LOG    file receiving a trace of what the script saw
--   OVERFACT_E2E_TIMEOUT milliseconds to wait for each step (default 30000)
-- On success the fixed buffer is written back to OVERFACT_E2E_FILE and
-- Neovim exits 0; on any failure it exits non-zero (cquit).

local logfile = assert(io.open(os.getenv("OVERFACT_E2E_LOG"), "w"))
local function log(...)
  logfile:write(table.concat(vim.tbl_map(tostring, { ... }), " "), "\n")
  logfile:flush()
end

local function fail(msg)
  log("FAIL: " .. msg)
  logfile:close()
  vim.cmd("cquit")
end

local function run()
  local cmd = vim.split(os.getenv("OVERFACT_E2E_CMD"), " ", { trimempty = true })
  local file = os.getenv("OVERFACT_E2E_FILE")
  local code = os.getenv("OVERFACT_E2E_CODE")
  local at = os.getenv("OVERFACT_E2E_AT")
  local timeout = tonumber(os.getenv("OVERFACT_E2E_TIMEOUT") or "30000")
  log("nvim", tostring(vim.version().major) .. "." .. vim.version().minor .. "." .. vim.version().patch)

  local client_id = vim.lsp.start_client({
    name = "overfact",
    cmd = cmd,
    root_dir = vim.fn.fnamemodify(file, ":h"),
    on_exit = function(code, signal)
      log("server exited", code, signal)
    end,
  })
  if not client_id then
    return fail("start_client returned nil")
  end

  vim.cmd("edit " .. vim.fn.fnameescape(file))
  local bufnr = vim.api.nvim_get_current_buf()
  if not vim.lsp.buf_attach_client(bufnr, client_id) then
    return fail("buf_attach_client failed")
  end

  local got = vim.wait(timeout, function()
    return #vim.diagnostic.get(bufnr) > 0
  end, 100)
  if not got then
    return fail("no diagnostics within " .. timeout .. " ms")
  end
  local client = vim.lsp.get_client_by_id(client_id)
  log("offset encoding", client.offset_encoding)

  local d
  for _, x in ipairs(vim.diagnostic.get(bufnr)) do
    log("diagnostic", x.lnum, x.col, x.end_lnum, x.end_col, x.severity, x.source, x.code, x.message)
    if x.code == code and not d then
      d = x
    end
  end
  if not d then
    return fail("no diagnostic with code " .. code)
  end
  -- Neovim converted the server's columns into byte columns; the finding
  -- must start exactly at the expected text even with non-ASCII runes
  -- before it on the line.
  local line = vim.api.nvim_buf_get_lines(bufnr, d.lnum, d.lnum + 1, true)[1]
  if line:sub(d.col + 1, d.col + #at) ~= at then
    return fail(string.format("diagnostic starts at byte %d of %q, not at %q", d.col, line, at))
  end

  -- Ask for code actions at the diagnostic, in the client's own encoding.
  -- vim.str_utfindex took (line, byte index) until 0.10 and takes
  -- (line, encoding, byte index) from 0.11 on.
  local start16
  if vim.fn.has("nvim-0.11") == 1 then
    start16 = vim.str_utfindex(line, "utf-16", d.col)
  else
    local _
    _, start16 = vim.str_utfindex(line, d.col)
  end
  local start = d.col
  if client.offset_encoding == "utf-16" then
    start = start16
  end
  local params = {
    textDocument = { uri = vim.uri_from_bufnr(bufnr) },
    range = {
      start = { line = d.lnum, character = start },
      ["end"] = { line = d.lnum, character = start },
    },
    context = { diagnostics = {} },
  }
  local responses = vim.lsp.buf_request_sync(bufnr, "textDocument/codeAction", params, timeout)
  local resp = responses and responses[client_id]
  if not resp or resp.err or not resp.result or #resp.result == 0 then
    return fail("no code actions: " .. vim.inspect(responses))
  end
  local action = resp.result[1]
  for _, a in ipairs(resp.result) do
    if a.isPreferred then
      action = a
      break
    end
  end
  log("applying", action.title, action.kind, tostring(action.isPreferred))
  vim.lsp.util.apply_workspace_edit(action.edit, client.offset_encoding)

  for i, l in ipairs(vim.api.nvim_buf_get_lines(bufnr, 0, -1, true)) do
    log(string.format("%3d| %s", i, l))
  end
  vim.cmd("write")

  -- An orderly shutdown: the server must exit on its own.
  vim.lsp.stop_client(client_id)
  local stopped = vim.wait(timeout, function()
    return vim.lsp.get_client_by_id(client_id) == nil
  end, 100)
  if not stopped then
    return fail("server did not stop")
  end
  log("OK")
  logfile:close()
  vim.cmd("qall!")
end

local ok, err = pcall(run)
if not ok then
  fail("error: " .. tostring(err))
end
